import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS, DIVISIONS, type Division } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useSearchParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { standingsDocuments } from '../api/standings-documents.js';
import { StandingsTable } from './standings-table.js';

/** Season standings across the published meets; season and division live in the address. */
export function SeasonStandingsView() {
  const [params, setParams] = useSearchParams();
  const seasons = useQuery(standingsDocuments.seasons);
  const list = seasons.data?.seasons ?? [];
  const seasonId = params.get('season') ?? list.find((s) => s.isCurrent)?.id ?? list[0]?.id ?? '';
  const division = (DIVISIONS.find((d) => d.toLowerCase() === params.get('division')) ?? 'MENS') as Division;
  const standings = useQuery(standingsDocuments.seasonStandings, { variables: { seasonId }, skip: !seasonId, fetchPolicy: 'cache-and-network' });
  const set = (change: { season?: string; division?: Division }) => {
    setParams(new URLSearchParams(paths.seasonStandings.href(change.season ?? seasonId, change.division ?? division).split('?')[1] ?? ''));
  };

  const data = standings.data?.standings;
  const shown = data?.divisions.find((d) => d.division === division);
  return (
    <Stack spacing={3}>
      <PageHeading lead="Team points added up across every published meet of the season.">Standings</PageHeading>
      <Stack direction={{ xs: 'column', sm: 'row' }} sx={{ gap: 2, alignItems: { sm: 'center' } }}>
        <TextField select label="Season" value={seasonId} onChange={(event) => set({ season: event.target.value })} sx={{ minWidth: 220 }}>
          {list.map((season) => (
            <MenuItem key={season.id} value={season.id}>{season.name}</MenuItem>
          ))}
        </TextField>
        <Tabs value={division} onChange={(_, value: Division) => set({ division: value })} aria-label="Division">
          {DIVISIONS.map((d) => (
            <Tab key={d} value={d} label={DIVISION_LABELS[d]} sx={{ minHeight: 48 }} />
          ))}
        </Tabs>
      </Stack>
      {(seasons.loading || (standings.loading && !data)) && <PageLoading label="Loading the standings" />}
      {standings.error && <Alert severity="error">{standings.error.message}</Alert>}
      {data && (
        <>
          {data.provisional && <Alert severity="warning">Some points are shared only until a run-off is run.</Alert>}
          {shown ? (
            <Paper variant="outlined" sx={{ pt: 1 }}>
              <StandingsTable standing={shown} showMeets />
            </Paper>
          ) : (
            <Alert severity="info">
              No {DIVISION_LABELS[division].toLowerCase()} results are published for {data.seasonName} yet. Standings appear here as soon as a
              meet&apos;s results are out; <Link component={RouterLink} to={paths.meets.href()}>see the meets</Link>.
            </Alert>
          )}
          <Typography variant="body2" component="p" sx={{ maxWidth: '70ch' }}>
            <strong>Tie-break.</strong> {data.tieBreak}
          </Typography>
          {data.meets.length > 0 && (
            <Typography variant="body2" sx={{ color: 'text.secondary' }}>
              Counted meets:{' '}
              {data.meets.map((meet, i) => (
                <span key={meet.id}>
                  {i > 0 && ', '}
                  <Link component={RouterLink} to={paths.meetResults.href(meet.id)}>{meet.name}</Link>
                </span>
              ))}
            </Typography>
          )}
        </>
      )}
    </Stack>
  );
}
