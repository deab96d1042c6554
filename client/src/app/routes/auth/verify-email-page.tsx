import Alert from '@mui/material/Alert';
import { useSearchParams } from 'react-router';

import { NarrowPage } from '../../../components/layouts/narrow-page.js';
import { PageHeading } from '../../../components/ui/page-heading.js';
import { VerifyEmailStatus } from '../../../features/auth/components/verify-email-status.js';

export function VerifyEmailPage() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return (
    <NarrowPage>
      <PageHeading compact>Confirm your e-mail</PageHeading>
      {token ? (
        <VerifyEmailStatus token={token} />
      ) : (
        <Alert severity="info">
          This page needs the link from the e-mail we sent you. Open that e-mail and tap the link, or copy the whole
          address into your browser.
        </Alert>
      )}
    </NarrowPage>
  );
}
