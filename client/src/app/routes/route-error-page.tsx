import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Container from '@mui/material/Container';
import Stack from '@mui/material/Stack';
import { isRouteErrorResponse, useRouteError } from 'react-router';

import { PageHeading } from '../../components/ui/page-heading.js';

/** Last resort when a page fails to load or draw, most often a stale copy after an update. */
export function RouteErrorPage() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : undefined;
  return (
    <Container component="main" maxWidth="sm" sx={{ py: 6 }}>
      <PageHeading lead="Reloading usually fixes it. If it keeps happening, tell your league administrator.">
        Something went wrong
      </PageHeading>
      <Stack spacing={2}>
        {detail && <Alert severity="error">{detail}</Alert>}
        <Button variant="contained" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
      </Stack>
    </Container>
  );
}
