import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useSearchParams } from 'react-router';
import { PageHeading } from '../../../components/ui/page-heading.js';

export function SearchPage() {
  const [params] = useSearchParams();
  const words = params.get('q')?.trim();
  return (
    <Stack spacing={3}>
      <PageHeading lead={words ? `You searched for “${words}”.` : undefined}>Search</PageHeading>
      <Paper variant="outlined" sx={{ p: { xs: 2.5, sm: 4 }, maxWidth: 720 }}>
        <Typography>
          Search arrives in a later release. It will answer questions like “which grind for wet poplar?” with the
          Field Notes that discuss it and the trial and result numbers behind them.
        </Typography>
      </Paper>
    </Stack>
  );
}
