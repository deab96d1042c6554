import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS, listSpecies } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { Link as RouterLink, useSearchParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { ResultRecord, UnitPreference } from '../api/types.js';
import { formatDay } from '../lib/format-day.js';
import { formatDiameter, headLabel, markLabel } from '../lib/format-result.js';

const SPECIES = listSpecies();

/** Best published result per event, species and diameter, with who, where and when. */
export function RecordsView({ units }: { units: UnitPreference }) {
  const [params, setParams] = useSearchParams();
  const filter = { seasonId: params.get('season') ?? '', eventTypeId: params.get('event') ?? '', speciesId: params.get('species') ?? '' };
  const options = useQuery(resultsDocuments.explorerOptions);
  const variables = { filter: Object.fromEntries(Object.entries(filter).filter(([, v]) => v)) };
  const { data, loading, error } = useQuery(resultsDocuments.records, { variables });
  const set = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next);
  };
  const columns: GridColDef<ResultRecord & { id: string }>[] = [
    { field: 'eventName', headerName: 'Event', flex: 1, minWidth: 150 },
    { field: 'speciesName', headerName: 'Species', flex: 1, minWidth: 150, valueGetter: (_v, row) => row.speciesName ?? 'No block' },
    { field: 'diameterMm', headerName: 'Diameter', width: 100, valueGetter: (_v, row) => (row.diameterMm === null ? '' : formatDiameter(row.diameterMm, units)) },
    { field: 'mark', headerName: 'Record', width: 120, valueGetter: (_v, row) => markLabel(row.result) },
    { field: 'holder', headerName: 'Held by', flex: 1.4, minWidth: 180, valueGetter: (_v, row) => `${row.result.label} (${row.result.clubShortName}, ${DIVISION_LABELS[row.result.division]})` },
    { field: 'meet', headerName: 'Meet', flex: 1.2, minWidth: 180, renderCell: ({ row }) => <Link component={RouterLink} to={paths.meetResults.href(row.result.meetId)}>{row.result.meetName}</Link> },
    { field: 'date', headerName: 'Date', width: 110, valueGetter: (_v, row) => formatDay(row.result.meetDate) },
    { field: 'head', headerName: 'Head', flex: 1, minWidth: 160, valueGetter: (_v, row) => headLabel(row.result, units) },
  ];
  const rows = (data?.records ?? []).map((r) => ({ ...r, id: `${r.eventTypeId}|${r.speciesId ?? ''}|${r.diameterMm ?? ''}` }));
  return (
    <Stack spacing={2}>
      <PageHeading lead="The best published time or score for each event on each species and block diameter.">Records</PageHeading>
      <Stack direction="row" sx={{ gap: 1.5, flexWrap: 'wrap' }}>
        <TextField select size="small" label="Season" value={filter.seasonId} onChange={(e) => set('season', e.target.value)} sx={{ minWidth: 180 }}>
          <MenuItem value="">All seasons</MenuItem>
          {(options.data?.seasons ?? []).map((s) => <MenuItem key={s.id} value={s.id}>{s.name}</MenuItem>)}
        </TextField>
        <TextField select size="small" label="Event" value={filter.eventTypeId} onChange={(e) => set('event', e.target.value)} sx={{ minWidth: 190 }}>
          <MenuItem value="">Every event</MenuItem>
          {(options.data?.eventTypes ?? []).map((t) => <MenuItem key={t.id} value={t.id}>{t.name}</MenuItem>)}
        </TextField>
        <TextField select size="small" label="Species" value={filter.speciesId} onChange={(e) => set('species', e.target.value)} sx={{ minWidth: 190 }}>
          <MenuItem value="">Every species</MenuItem>
          {SPECIES.map((s) => <MenuItem key={s.id} value={s.id}>{s.commonName}</MenuItem>)}
        </TextField>
      </Stack>
      {error && <Alert severity="error">{error.message}</Alert>}
      <DataGrid
        rows={rows}
        columns={columns}
        loading={loading}
        autoHeight
        disableRowSelectionOnClick
        disableVirtualization
        pageSizeOptions={[25, 50, 100]}
        initialState={{ pagination: { paginationModel: { pageSize: 25 } } }}
        aria-label="Records"
        localeText={{ noRowsLabel: 'No records yet: they appear once a meet’s results are published.' }}
      />
    </Stack>
  );
}
