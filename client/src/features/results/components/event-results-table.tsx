import { DIVISION_LABELS } from '@endgrain/shared';
import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { Fragment } from 'react';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { MeetEventResults, UnitPreference } from '../api/types.js';
import { blockLabel, formatDiameter, headLabel, markLabel, penaltyLabel, placeLabel, pointsLabel } from '../lib/format-result.js';

const hideOnPhone = { display: { xs: 'none', md: 'table-cell' } } as const;

/** One meet event's results, ranked: place, athletes, club, time or score, penalty, points, head, block. */
export function EventResultsTable({ event, units }: { event: MeetEventResults; units: UnitPreference }) {
  const title = `${event.eventName} · ${DIVISION_LABELS[event.division]}`;
  const block = [event.speciesName, event.diameterMm === null ? null : formatDiameter(event.diameterMm, units)].filter(Boolean).join(', ');
  const markHeader = event.resultKind === 'TIMED' ? 'Time' : event.resultKind === 'SCORED' ? 'Score' : 'Hits';
  return (
    <Paper variant="outlined" component="section" aria-label={title}>
      <Stack direction="row" sx={{ px: 2, pt: 2, pb: 1, gap: 1, flexWrap: 'wrap', alignItems: 'baseline' }}>
        <Typography variant="h3" component="h3">{title}</Typography>
        {block && <Typography variant="body2" sx={{ color: 'text.secondary' }}>{block}</Typography>}
        {event.weight !== 1 && <Chip size="small" label={`Points ×${event.weight}`} />}
        {event.provisional && <Chip size="small" color="warning" label="Waiting for a run-off" />}
      </Stack>
      {event.results.length === 0 ? (
        <Typography sx={{ px: 2, pb: 2, color: 'text.secondary' }}>No results posted for this event yet.</Typography>
      ) : (
        <TableContainer>
          <Table size="small" aria-label={`${title} results`}>
            <TableHead>
              <TableRow>
                <TableCell>Place</TableCell>
                <TableCell>Athletes</TableCell>
                <TableCell sx={hideOnPhone}>Club</TableCell>
                <TableCell align="right">{markHeader}</TableCell>
                <TableCell align="right" sx={hideOnPhone}>Penalty</TableCell>
                <TableCell align="right">Points</TableCell>
                {event.usesHead && <TableCell sx={hideOnPhone}>Head</TableCell>}
                <TableCell sx={hideOnPhone}>Block</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {event.results.map((r) => (
                <TableRow key={r.id} hover>
                  <TableCell sx={{ fontWeight: 700 }}>{placeLabel(r)}</TableCell>
                  <TableCell>
                    {r.athletes.map((a, i) => (
                      <Fragment key={a.id}>
                        {i > 0 && ' & '}
                        <Link component={RouterLink} to={paths.athlete.href(a.id)}>{a.name}</Link>
                      </Fragment>
                    ))}
                    <Typography variant="caption" component="div" sx={{ color: 'text.secondary', display: { md: 'none' } }}>
                      {r.clubShortName}{r.reason ? ` · ${r.reason}` : ''}
                    </Typography>
                    {r.reason && <Typography variant="caption" component="div" sx={{ color: 'text.secondary', display: { xs: 'none', md: 'block' } }}>{r.reason}</Typography>}
                  </TableCell>
                  <TableCell sx={hideOnPhone}>{r.clubName}</TableCell>
                  <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>{markLabel(r)}</TableCell>
                  <TableCell align="right" sx={hideOnPhone}>{penaltyLabel(r.penaltyHundredths)}</TableCell>
                  <TableCell align="right">{pointsLabel(r.points)}{r.countsForClub ? '' : ' *'}</TableCell>
                  {event.usesHead && <TableCell sx={hideOnPhone}>{headLabel(r, units)}</TableCell>}
                  <TableCell sx={hideOnPhone}>
                    {/* The event names the block; a result says only what differed on the day. */}
                    {blockLabel({
                      speciesName: r.speciesId !== event.speciesId ? r.speciesName : null,
                      diameterMm: r.diameterMm !== event.diameterMm ? r.diameterMm : null,
                      condition: r.condition,
                    }, units)}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}
      {event.results.some((r) => !r.countsForClub) && (
        <Typography variant="caption" component="p" sx={{ px: 2, py: 1, color: 'text.secondary' }}>
          * Only each club&apos;s best entry scores in this event.
        </Typography>
      )}
    </Paper>
  );
}
