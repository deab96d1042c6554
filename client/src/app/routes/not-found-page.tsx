import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../components/ui/page-heading.js';
import { paths } from '../../config/paths.js';

export function NotFoundPage() {
  return (
    <Stack spacing={2} sx={{ alignItems: 'flex-start' }}>
      <PageHeading lead="The address may be mistyped, or the page has moved.">Nothing here</PageHeading>
      <Button component={RouterLink} to={paths.home.href()} variant="contained">
        Go to the start page
      </Button>
    </Stack>
  );
}
