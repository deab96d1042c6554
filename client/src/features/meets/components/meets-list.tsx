import { useQuery } from '@apollo/client/react';
import Add from '@mui/icons-material/Add';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import { useTheme } from '@mui/material/styles';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { Link as RouterLink } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { meetsDocuments } from '../api/meets-documents.js';
import { useMeetsFilter } from '../lib/use-meets-filter.js';
import { MeetCard } from './meet-card.js';
import { MeetsFilters } from './meets-filters.js';
import { MeetsTable } from './meets-table.js';

export interface MeetsListProps {
  /** Organisers see drafts and the "New meet" button (the server decides what they may do). */
  canRunMeets: boolean;
}

/** Upcoming or past meets with their filters in the address; cards on a phone, a table on a laptop. */
export function MeetsList({ canRunMeets }: MeetsListProps) {
  const theme = useTheme();
  const isNarrow = useMediaQuery(theme.breakpoints.down('md'), { noSsr: true });
  const { filter, setFilter, variables, narrowed } = useMeetsFilter();
  const options = useQuery(meetsDocuments.leagueOptions);
  // Shown from the cache at once, then refreshed: counts and new meets change from other screens.
  const meets = useQuery(meetsDocuments.meets, { variables: { filter: variables }, fetchPolicy: 'cache-and-network' });

  return (
    <Stack spacing={3}>
      {canRunMeets && (
        <Button
          component={RouterLink}
          to={paths.newMeet.href()}
          variant="contained"
          size="large"
          startIcon={<Add />}
          sx={{ alignSelf: 'flex-start' }}
        >
          New meet
        </Button>
      )}
      <MeetsFilters
        filter={filter}
        onChange={setFilter}
        seasons={options.data?.seasons ?? []}
        clubs={options.data?.clubs ?? []}
        showDrafts={canRunMeets}
        narrowed={narrowed}
      />
      {meets.error ? (
        <Alert severity="error" role="alert" action={<Button onClick={() => void meets.refetch()}>Try again</Button>}>
          {graphQLErrorDetails(meets.error)[0]?.message}
        </Alert>
      ) : meets.loading && !meets.data ? (
        <PageLoading label="Loading meets" />
      ) : (meets.data?.meets.length ?? 0) === 0 ? (
        <EmptyMeets when={filter.when} narrowed={narrowed} canRunMeets={canRunMeets} onClear={() => setFilter({ seasonId: '', clubId: '', status: '' })} onPast={() => setFilter({ when: 'PAST' })} />
      ) : isNarrow ? (
        <Stack component="ul" spacing={1.5} sx={{ p: 0, m: 0 }} aria-label="Meets">
          {meets.data!.meets.map((meet) => (
            <MeetCard key={meet.id} meet={meet} />
          ))}
        </Stack>
      ) : (
        <MeetsTable meets={meets.data!.meets} />
      )}
    </Stack>
  );
}

interface EmptyMeetsProps {
  when: 'UPCOMING' | 'PAST';
  narrowed: boolean;
  canRunMeets: boolean;
  onClear: () => void;
  onPast: () => void;
}

/** Says why the list is empty and offers the next step. */
function EmptyMeets({ when, narrowed, canRunMeets, onClear, onPast }: EmptyMeetsProps) {
  let text: string;
  let action: { label: string; onClick?: () => void; to?: string } | undefined;
  if (narrowed) {
    text = `No ${when === 'PAST' ? 'past' : 'upcoming'} meets match these filters.`;
    action = { label: 'Clear filters', onClick: onClear };
  } else if (when === 'PAST') {
    text = 'No meets have taken place yet this season. Results will be listed here once the first meet is over.';
  } else if (canRunMeets) {
    text = 'No upcoming meets yet. Build the next one: name, date, venue and scoring first, then add its events.';
    action = { label: 'New meet', to: paths.newMeet.href() };
  } else {
    text = 'No upcoming meets have been announced yet. Meets appear here as soon as organisers open them for entries.';
    action = { label: 'See past meets', onClick: onPast };
  }
  return (
    <Paper variant="outlined" sx={{ p: { xs: 2.5, sm: 4 } }} role="status">
      <Stack spacing={2} sx={{ alignItems: 'flex-start' }}>
        <Typography>{text}</Typography>
        {action &&
          (action.to ? (
            <Button component={RouterLink} to={action.to} variant="outlined">
              {action.label}
            </Button>
          ) : (
            <Button onClick={action.onClick} variant="outlined">
              {action.label}
            </Button>
          ))}
      </Stack>
    </Paper>
  );
}
