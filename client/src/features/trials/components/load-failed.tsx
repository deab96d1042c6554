import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';

import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';

/** A query that did not come back: the server's words and a way to try again. */
export function LoadFailed({ error, onRetry }: { error: unknown; onRetry: () => void }) {
  return (
    <Alert severity="error" role="alert" action={<Button onClick={onRetry}>Try again</Button>}>
      {graphQLErrorDetails(error)[0]?.message}
    </Alert>
  );
}
