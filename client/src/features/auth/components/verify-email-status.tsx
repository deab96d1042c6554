import { useMutation } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useEffect, useRef } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { authDocuments } from '../api/auth-documents.js';
import { useAuth } from '../hooks/use-auth.js';
import { ResendVerificationButton } from './resend-verification-button.js';

/** Confirms the e-mail address from the link's token as soon as the page opens. */
export function VerifyEmailStatus({ token }: { token: string }) {
  const { user } = useAuth();
  const [verify, { data, error }] = useMutation(authDocuments.verifyEmail);
  // React's development double-mount must not spend a single-use token twice.
  const started = useRef(false);
  useEffect(() => {
    if (started.current) return;
    started.current = true;
    void verify({ variables: { token } }).catch(() => undefined);
  }, [verify, token]);

  if (data) {
    return (
      <Stack spacing={2}>
        <Alert severity="success" role="status">
          Thank you, {data.verifyEmail.displayName}: {data.verifyEmail.email} is confirmed.
        </Alert>
        <Button component={RouterLink} to={user ? paths.account.href() : paths.auth.signIn.href()} variant="contained">
          {user ? 'Go to your account' : 'Sign in'}
        </Button>
      </Stack>
    );
  }

  if (error) {
    const message = graphQLErrorDetails(error)
      .map((detail) => detail.message)
      .join(' ');
    return (
      <Stack spacing={2}>
        <Alert severity="error" role="alert">
          {message}
        </Alert>
        {user ? (
          <ResendVerificationButton label="Send me a new link" />
        ) : (
          <Button component={RouterLink} to={paths.auth.signIn.href(paths.account.href())} variant="contained">
            Sign in to get a new link
          </Button>
        )}
      </Stack>
    );
  }

  return <PageLoading label="Confirming your e-mail address" />;
}
