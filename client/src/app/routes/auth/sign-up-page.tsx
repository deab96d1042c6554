import Typography from '@mui/material/Typography';
import { Navigate, useNavigate } from 'react-router';

import { NarrowPage } from '../../../components/layouts/narrow-page.js';
import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { SignUpForm } from '../../../features/auth/components/sign-up-form.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { AuthLinks } from './auth-links.js';
import { useReturnPath } from './use-return-path.js';

export function SignUpPage() {
  const { user } = useAuth();
  const navigate = useNavigate();
  const returnPath = useReturnPath();
  // New members land on their account page, where the "confirm your e-mail" reminder shows.
  const next = returnPath ?? paths.account.href();
  if (user) return <Navigate to={next} replace />;

  return (
    <NarrowPage>
      <PageHeading compact>Create account</PageHeading>
      <Typography sx={{ mb: 3, color: 'text.secondary' }}>
        Anyone can read published results. An account lets your coach add you to your club&apos;s roster, rack and
        trials.
      </Typography>
      <SignUpForm onSignedUp={() => void navigate(next, { replace: true })} />
      <AuthLinks links={[{ to: paths.auth.signIn.href(returnPath), label: 'Already have an account? Sign in' }]} />
    </NarrowPage>
  );
}
