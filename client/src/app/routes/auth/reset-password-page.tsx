import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { Link as RouterLink, useSearchParams } from 'react-router';

import { NarrowPage } from '../../../components/layouts/narrow-page.js';
import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { ResetPasswordForm } from '../../../features/auth/components/reset-password-form.js';

export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token');
  const [done, setDone] = useState(false);

  let body;
  if (done) {
    body = (
      <Stack spacing={2}>
        <Alert severity="success" role="status">
          Your new password is set.
        </Alert>
        <Button component={RouterLink} to={paths.auth.signIn.href()} variant="contained">
          Sign in
        </Button>
      </Stack>
    );
  } else if (token) {
    body = <ResetPasswordForm token={token} onDone={() => setDone(true)} />;
  } else {
    body = (
      <Stack spacing={2}>
        <Alert severity="info">This page needs the link from the password e-mail we sent you.</Alert>
        <Button component={RouterLink} to={paths.auth.forgotPassword.href()} variant="outlined">
          Ask for a reset link
        </Button>
      </Stack>
    );
  }

  return (
    <NarrowPage>
      <PageHeading compact>Choose a new password</PageHeading>
      {body}
    </NarrowPage>
  );
}
