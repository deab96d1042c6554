import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS, formatTime } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { standingsDocuments } from '../api/standings-documents.js';
import type { EventWinner } from '../api/types.js';
import { StandingsTable } from './standings-table.js';

function mark(winner: EventWinner): string {
  if (winner.resultKind === 'TIMED') return winner.totalHundredths === null ? '' : formatTime(winner.totalHundredths);
  return winner.resultKind === 'FEWEST_HITS' ? `${winner.score ?? 0} hits` : String(winner.score ?? 0);
}

/** A meet's team totals per division, the tie-break in words, and each event's winner. */
export function MeetStandingsPanel({ meetId }: { meetId: string }) {
  const { data, error, loading } = useQuery(standingsDocuments.meetStandings, { variables: { meetId }, fetchPolicy: 'cache-and-network' });
  if (loading && !data) return <PageLoading label="Loading the team totals" />;
  if (error || !data) return null;
  const standings = data.meetStandings;
  if (standings.divisions.length === 0) return null;
  return (
    <Stack component="section" aria-labelledby="meet-standings" spacing={2}>
      <Typography id="meet-standings" variant="h2">
        Team totals
      </Typography>
      {standings.provisional && <Alert severity="warning">Some points are shared only until a run-off is run.</Alert>}
      {standings.divisions.map((division) => (
        <Paper key={division.division} variant="outlined" sx={{ pt: 1 }}>
          <Typography variant="h3" sx={{ px: 2, py: 1 }}>{DIVISION_LABELS[division.division]}</Typography>
          <StandingsTable standing={division} showMeets={false} />
        </Paper>
      ))}
      <Typography variant="body2" sx={{ color: 'text.secondary' }}>Tie-break: {standings.tieBreak}</Typography>
      {standings.eventWinners.length > 0 && (
        <Paper variant="outlined" component="section" aria-labelledby="event-winners">
          <Typography id="event-winners" variant="h3" sx={{ px: 2, pt: 2 }}>Event winners</Typography>
          <List dense>
            {standings.eventWinners.map((winner) => (
              <ListItem key={winner.id}>
                <ListItemText
                  primary={`${winner.eventName} · ${DIVISION_LABELS[winner.division]}: ${winner.label}${winner.tied ? ' (tied)' : ''}`}
                  secondary={`${winner.clubShortName} · ${mark(winner)}`}
                />
              </ListItem>
            ))}
          </List>
        </Paper>
      )}
    </Stack>
  );
}
