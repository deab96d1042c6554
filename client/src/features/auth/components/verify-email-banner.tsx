import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';

import { useAuth } from '../hooks/use-auth.js';
import { ResendVerificationButton } from './resend-verification-button.js';

/** Reminds a signed-in member to confirm their address; clubs rely on it to reach them. */
export function VerifyEmailBanner() {
  const { user } = useAuth();
  if (!user || user.emailVerified) return null;
  return (
    // The button sits under the text (not beside it) so a long address still fits a phone.
    <Alert severity="info" sx={{ mb: 2, '& .MuiAlert-message': { overflow: 'visible', overflowWrap: 'anywhere' } }}>
      Please confirm your e-mail address: we sent a link to {user.email}.
      <Box sx={{ mt: 1 }}>
        <ResendVerificationButton label="Resend" />
      </Box>
    </Alert>
  );
}
