import { useMutation } from '@apollo/client/react';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import Box from '@mui/material/Box';

import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { authDocuments } from '../api/auth-documents.js';

/** Asks the server to send the confirmation e-mail again, and says what happened. */
export function ResendVerificationButton({ label = 'Resend the link' }: { label?: string }) {
  const [resend, { loading, data, error, called }] = useMutation(authDocuments.resendVerification);
  const sent = called && !loading && data?.resendVerification === true;

  return (
    <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.5, flexWrap: 'wrap' }}>
      {!sent && (
        <Button
          variant="outlined"
          color="inherit"
          loading={loading}
          loadingPosition="start"
          onClick={() => void resend().catch(() => undefined)}
        >
          {label}
        </Button>
      )}
      <Typography role="status" variant="body2">
        {sent && 'Sent. Check your inbox for the new link.'}
        {error && graphQLErrorDetails(error).map((detail) => detail.message).join(' ')}
      </Typography>
    </Box>
  );
}
