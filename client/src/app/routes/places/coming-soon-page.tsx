import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { places, type PlaceKey } from '../../../config/places.js';

/** Stands in for a place that is not built yet, saying what it will be for. */
export function ComingSoonPage({ placeKey }: { placeKey: PlaceKey }) {
  const place = places.find((candidate) => candidate.key === placeKey);
  if (!place) throw new Error(`Unknown place "${placeKey}"`);
  return (
    <Stack spacing={3}>
      <PageHeading>{place.label}</PageHeading>
      <Paper variant="outlined" sx={{ p: { xs: 2.5, sm: 4 }, maxWidth: 720 }}>
        <Stack spacing={2} sx={{ alignItems: 'flex-start' }}>
          <Chip label="Coming in a later release" color="secondary" variant="outlined" />
          <Typography variant="body1">{place.summary}</Typography>
          <Button component={RouterLink} to={paths.home.href()} variant="outlined">
            Back to the start page
          </Button>
        </Stack>
      </Paper>
    </Stack>
  );
}
