import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS } from '@endgrain/shared';
import Link from '@mui/material/Link';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { UnitPreference } from '../api/types.js';
import { formatDay } from '../lib/format-day.js';
import { blockLabel, headLabel, markLabel, placeLabel } from '../lib/format-result.js';

/** On an axe's page: its latest published results, each with the head setup it was chopped with then. */
export function AxeResultsList({ axeId, units }: { axeId: string; units: UnitPreference }) {
  const { data, loading, error } = useQuery(resultsDocuments.axeResults, { variables: { axeId } });
  if (loading && !data) return <Typography sx={{ color: 'text.secondary' }}>Loading results…</Typography>;
  if (error || !data) return <Typography sx={{ color: 'text.secondary' }}>Results could not be loaded; try again shortly.</Typography>;
  const results = data.axeResults;
  if (results.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No published results with this axe yet. They appear here once a meet it was used at is published.</Typography>;
  }
  return (
    <>
      <List dense disablePadding aria-label="Published results with this axe">
        {results.map((r) => (
          <ListItem key={r.id} disableGutters divider>
            <ListItemText
              primary={
                <>
                  <Link component={RouterLink} to={paths.meetResults.href(r.meetId)}>{r.meetName}</Link>
                  {` · ${formatDay(r.meetDate)} · ${r.eventName}, ${DIVISION_LABELS[r.division]}`}
                </>
              }
              secondary={[
                `${r.athletes.map((a) => a.name).join(' & ')}: ${r.resultKind === 'SCORED' ? 'score ' : ''}${markLabel(r)}, ${r.place === null ? placeLabel(r) : `place ${placeLabel(r)}`}`,
                // The page is this axe's: its label is left out of the head the result was chopped with.
                `head then: ${headLabel({ ...r, axeLabel: null }, units) || 'not recorded'}`,
                blockLabel(r, units),
              ].filter(Boolean).join(' · ')}
            />
          </ListItem>
        ))}
      </List>
      {results.length >= 50 && <Typography variant="caption" sx={{ color: 'text.secondary' }}>The latest 50 results; the results explorer holds the rest.</Typography>}
    </>
  );
}
