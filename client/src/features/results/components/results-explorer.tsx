import { useQuery } from '@apollo/client/react';
import { DIVISION_LABELS } from '@endgrain/shared';
import Download from '@mui/icons-material/Download';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { DataGrid, type GridColDef, type GridSortModel } from '@mui/x-data-grid';
import { Link as RouterLink, useSearchParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { paths } from '../../../config/paths.js';
import { resultsDocuments } from '../api/results-documents.js';
import type { Result, ResultSortField, UnitPreference } from '../api/types.js';
import { exportHref, readExplorerParams, writeExplorerParams, type ExplorerState } from '../lib/explorer-params.js';
import { formatDay } from '../lib/format-day.js';
import { blockLabel, headLabel, markLabel, placeLabel, pointsLabel } from '../lib/format-result.js';
import { ExplorerFilters } from './explorer-filters.js';

const SORT_FOR_COLUMN: Record<string, ResultSortField> = { meetDate: 'DATE', place: 'PLACE', mark: 'TIME', score: 'SCORE', points: 'POINTS', diameterMm: 'DIAMETER', bevel: 'BEVEL' };
const COLUMN_FOR_SORT = Object.fromEntries(Object.entries(SORT_FOR_COLUMN).map(([column, sort]) => [sort, column]));

function columns(units: UnitPreference): GridColDef<Result>[] {
  return [
    { field: 'meetDate', headerName: 'Date', width: 110, valueFormatter: (value: string) => formatDay(value) },
    { field: 'meetName', headerName: 'Meet', flex: 1.2, minWidth: 160, sortable: false, renderCell: ({ row }) => <Link component={RouterLink} to={paths.meetResults.href(row.meetId)}>{row.meetName}</Link> },
    { field: 'eventName', headerName: 'Event', flex: 1, minWidth: 150, sortable: false, valueGetter: (_v, row) => `${row.eventName} · ${DIVISION_LABELS[row.division]}` },
    { field: 'place', headerName: 'Place', width: 76, valueGetter: (_v, row) => placeLabel(row) },
    { field: 'label', headerName: 'Athletes', flex: 1.4, minWidth: 170, sortable: false },
    { field: 'clubShortName', headerName: 'Club', width: 90, sortable: false },
    { field: 'mark', headerName: 'Time / score', width: 130, align: 'right', headerAlign: 'right', valueGetter: (_v, row) => markLabel(row) },
    { field: 'points', headerName: 'Points', width: 90, type: 'number', valueFormatter: (value: number) => pointsLabel(value) },
    { field: 'bevel', headerName: 'Head', flex: 1.2, minWidth: 170, valueGetter: (_v, row) => headLabel(row, units) },
    { field: 'diameterMm', headerName: 'Block', flex: 1.2, minWidth: 170, valueGetter: (_v, row) => blockLabel(row, units) },
  ];
}

/** Published times across every club, filtered, sorted and paged on the server; the filter is the address. */
export function ResultsExplorer({ units }: { units: UnitPreference }) {
  const [params, setParams] = useSearchParams();
  const state = readExplorerParams(params);
  const options = useQuery(resultsDocuments.explorerOptions);
  const { data, previousData, loading, error } = useQuery(resultsDocuments.results, {
    variables: { filter: state.filter, sort: state.sort, page: { page: state.page, pageSize: state.pageSize } },
  });
  const page = (data ?? previousData)?.results;
  const go = (change: Partial<ExplorerState>) => setParams(writeExplorerParams({ ...state, ...change }));
  const sortModel: GridSortModel = [{ field: COLUMN_FOR_SORT[state.sort.field] ?? 'mark', sort: state.sort.direction === 'DESC' ? 'desc' : 'asc' }];
  const narrowed = Object.keys(state.filter).length > 0;

  return (
    <Stack spacing={2}>
      <PageHeading lead="Every published result across every club, with the head and block it was cut with.">Results</PageHeading>
      <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap' }}>
        <Button component={RouterLink} to={paths.records.href()} variant="outlined">Records</Button>
        <Button component={RouterLink} to={paths.seasonStandings.href()} variant="outlined">Standings</Button>
        <Button component="a" href={exportHref(state)} download startIcon={<Download />}>Export these results (CSV)</Button>
      </Stack>
      <ExplorerFilters key={params.toString()} filter={state.filter} options={options.data} units={units} onChange={(filter) => go({ filter, page: 0 })} />
      {error && <Alert severity="error">{error.message}</Alert>}
      {page?.capped && (
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>
          More than {page.total.toLocaleString('en')} results match; narrow the filter to page through them all, or export them.
        </Typography>
      )}
      <DataGrid
        rows={page?.rows ?? []}
        columns={columns(units)}
        loading={loading}
        rowCount={page?.total ?? 0}
        paginationMode="server"
        sortingMode="server"
        paginationModel={{ page: state.page, pageSize: state.pageSize }}
        onPaginationModelChange={(model) => go({ page: model.pageSize === state.pageSize ? model.page : 0, pageSize: model.pageSize })}
        sortModel={sortModel}
        onSortModelChange={(model) => {
          const first = model[0];
          go({ sort: { field: (first && SORT_FOR_COLUMN[first.field]) || 'TIME', direction: first?.sort === 'desc' ? 'DESC' : 'ASC' }, page: 0 });
        }}
        pageSizeOptions={[25, 50, 100]}
        disableColumnFilter
        disableRowSelectionOnClick
        disableVirtualization
        autoHeight
        aria-label="Results"
        localeText={{ noRowsLabel: narrowed ? 'No published results match these filters. Widen them, or clear the filters.' : 'No results are published yet. They appear here once an organiser publishes a meet.' }}
      />
      <Typography variant="caption" sx={{ color: 'text.secondary' }}>
        Diameters in {units === 'IMPERIAL' ? 'inches' : 'millimetres'} (change units in your account). Times are official times plus penalties, m:ss.hh.
      </Typography>
    </Stack>
  );
}
