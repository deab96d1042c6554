import { Navigate, useNavigate } from 'react-router';

import { NarrowPage } from '../../../components/layouts/narrow-page.js';
import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { SignInForm } from '../../../features/auth/components/sign-in-form.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { AuthLinks } from './auth-links.js';
import { useReturnPath } from './use-return-path.js';

export function SignInPage() {
  const { user } = useAuth();
  const navigate = useNavigate();
  const returnPath = useReturnPath();
  const returnTo = returnPath ?? paths.home.href();
  if (user) return <Navigate to={returnTo} replace />;

  return (
    <NarrowPage>
      <PageHeading compact>Sign in</PageHeading>
      <SignInForm onSignedIn={() => void navigate(returnTo, { replace: true })} />
      <AuthLinks
        links={[
          { to: paths.auth.forgotPassword.href(), label: 'Forgotten your password?' },
          { to: paths.auth.signUp.href(returnPath), label: 'New to Endgrain? Create an account' },
        ]}
      />
    </NarrowPage>
  );
}
