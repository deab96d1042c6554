import Typography from '@mui/material/Typography';

import { NarrowPage } from '../../../components/layouts/narrow-page.js';
import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { ForgotPasswordForm } from '../../../features/auth/components/forgot-password-form.js';
import { AuthLinks } from './auth-links.js';

export function ForgotPasswordPage() {
  return (
    <NarrowPage>
      <PageHeading compact>Forgotten password</PageHeading>
      <Typography sx={{ mb: 3, color: 'text.secondary' }}>
        Enter the e-mail address you signed up with and we will send you a link to choose a new password.
      </Typography>
      <ForgotPasswordForm />
      <AuthLinks links={[{ to: paths.auth.signIn.href(), label: 'Remembered it? Sign in' }]} />
    </NarrowPage>
  );
}
