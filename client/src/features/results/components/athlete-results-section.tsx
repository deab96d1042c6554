import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS, formatTime } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { LineChart } from '@mui/x-charts/LineChart';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { Result, UnitPreference } from '../api/types.js';
import { formatDay } from '../lib/format-day.js';
import { blockLabel, formatDiameter, headLabel, markLabel, placeLabel, pointsLabel } from '../lib/format-result.js';
import { progression } from '../lib/progression.js';

/** On the athlete's page: personal bests per event and block, a progression chart, every result. */
export function AthleteResultsSection({ athleteId, units }: { athleteId: string; units: UnitPreference }) {
  const { data, loading, error } = useQuery(resultsDocuments.athleteResults, { variables: { athleteId } });
  const [chosen, setChosen] = useState('');
  if (loading && !data) return <PageLoading label="Loading the athlete's results" />;
  if (error || !data) return <Alert severity="error">{error?.message ?? 'The results could not be loaded.'}</Alert>;
  const athlete = data.athleteResults;
  if (athlete.results.length === 0) {
    return (
      <Stack component="section" aria-labelledby="athlete-results" spacing={1}>
        <Typography id="athlete-results" variant="h2">Results</Typography>
        <Typography sx={{ color: 'text.secondary' }}>No published results yet. They appear here after the athlete's first meet is published.</Typography>
      </Stack>
    );
  }
  const lines = progression(athlete.results, (mm) => formatDiameter(mm, units));
  const line = lines.find((l) => l.key === chosen) ?? lines[0];
  const columns: GridColDef<Result>[] = [
    { field: 'meetDate', headerName: 'Date', width: 110, valueFormatter: (value: string) => formatDay(value) },
    { field: 'meetName', headerName: 'Meet', flex: 1.2, minWidth: 160, renderCell: ({ row }) => <Link component={RouterLink} to={paths.meetResults.href(row.meetId)}>{row.meetName}</Link> },
    { field: 'eventName', headerName: 'Event', flex: 1, minWidth: 150, valueGetter: (_v, row) => `${row.eventName} · ${DIVISION_LABELS[row.division]}` },
    { field: 'place', headerName: 'Place', width: 80, valueGetter: (_v, row) => placeLabel(row) },
    { field: 'mark', headerName: 'Time / score', width: 130, valueGetter: (_v, row) => markLabel(row) },
    { field: 'points', headerName: 'Points', width: 80, valueFormatter: (value: number) => pointsLabel(value) },
    { field: 'head', headerName: 'Head', flex: 1, minWidth: 160, valueGetter: (_v, row) => headLabel(row, units) },
    { field: 'block', headerName: 'Block', flex: 1, minWidth: 170, valueGetter: (_v, row) => blockLabel(row, units) },
  ];
  return (
    <Stack component="section" aria-labelledby="athlete-results" spacing={2}>
      <Typography id="athlete-results" variant="h2">Results</Typography>
      <Typography variant="h3">Personal bests</Typography>
      <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: 'repeat(2, 1fr)', md: 'repeat(3, 1fr)' } }}>
        {athlete.personalBests.map((best) => (
          <Paper key={`${best.eventTypeId}|${best.diameterMm ?? ''}`} variant="outlined" sx={{ p: 2 }}>
            <Typography variant="body2" sx={{ color: 'text.secondary' }}>
              {best.eventName}{best.diameterMm === null ? '' : `, ${formatDiameter(best.diameterMm, units)}`}
            </Typography>
            <Typography variant="h3" component="p" sx={{ fontVariantNumeric: 'tabular-nums' }}>{markLabel(best.result)}</Typography>
            <Typography variant="body2">{best.result.meetName}, {formatDay(best.result.meetDate)}</Typography>
          </Paper>
        ))}
      </Box>
      {line && (
        <Paper variant="outlined" sx={{ p: 2 }}>
          <Stack direction="row" sx={{ gap: 2, alignItems: 'center', flexWrap: 'wrap' }}>
            <Typography variant="h3">Progression</Typography>
            {lines.length > 1 && (
              <TextField select size="small" label="Event and block" value={line.key} onChange={(e) => setChosen(e.target.value)} sx={{ minWidth: 240 }}>
                {lines.map((l) => <MenuItem key={l.key} value={l.key}>{l.label}</MenuItem>)}
              </TextField>
            )}
          </Stack>
          <Box role="figure" aria-label={`${line.label}: ${line.kind === 'TIMED' ? 'time in seconds' : 'score'} at each meet, oldest first`}>
            <LineChart
              height={260}
              xAxis={[{ data: line.points.map((p) => p.date), scaleType: 'time', label: 'Meet date', valueFormatter: (d: Date) => formatDay(d.toISOString().slice(0, 10)), height: 52 }]}
              yAxis={[{ label: line.kind === 'TIMED' ? 'Time (s)' : line.kind === 'SCORED' ? 'Score' : 'Hits', width: 64 }]}
              series={[{
                data: line.points.map((p) => p.value),
                label: line.label,
                curve: 'linear',
                showMark: true,
                valueFormatter: (v: number | null) => (v === null ? '' : line.kind === 'TIMED' ? formatTime(Math.round(v * 100)) : String(v)),
              }]}
            />
          </Box>
          <Typography variant="caption" sx={{ color: 'text.secondary' }}>
            {line.points.length === 1 ? 'One meet so far: the line grows with the next result on this block. ' : ''}
            {line.kind === 'TIMED' ? 'Lower is faster.' : ''}
          </Typography>
        </Paper>
      )}
      <Typography variant="h3">Every result</Typography>
      <DataGrid rows={athlete.results} columns={columns} autoHeight disableRowSelectionOnClick disableVirtualization hideFooter={athlete.results.length <= 25}
        initialState={{ sorting: { sortModel: [{ field: 'meetDate', sort: 'desc' }] }, pagination: { paginationModel: { pageSize: 25 } } }} pageSizeOptions={[25, 50]} aria-label="Every result" />
    </Stack>
  );
}
