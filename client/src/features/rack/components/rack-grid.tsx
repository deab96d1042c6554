import Link from '@mui/material/Link';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { Axe, UnitPreference } from '../api/types.js';
import { GRIND_LABELS, USE_LABELS } from '../lib/rack-labels.js';
import { showBevel, showLength, showMass } from '../lib/setup-units.js';
import { AxeStatusChip } from './axe-status-chip.js';

export interface RackGridProps {
  axes: Axe[];
  units: UnitPreference;
}

/** The club's axes as a table; on a phone only label, status and grind stay. Every row is rendered. */
export function RackGrid({ axes, units }: RackGridProps) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const columns: GridColDef<Axe>[] = [
    {
      field: 'label',
      headerName: 'Axe',
      flex: 1,
      minWidth: 110,
      renderCell: ({ row }) => (
        <Link component={RouterLink} to={paths.rackAxe.href(row.id)}>
          {row.label}
        </Link>
      ),
    },
    { field: 'status', headerName: 'Status', width: 150, renderCell: ({ row }) => <AxeStatusChip status={row.status} /> },
    { field: 'grind', headerName: 'Grind', width: 110, valueGetter: (_value, row) => GRIND_LABELS[row.grind] },
    {
      field: 'bevel',
      headerName: 'Bevel',
      flex: 1.2,
      minWidth: 180,
      valueGetter: (_value, row) => showBevel(row.geometry.includedAngleDeg, row.geometry.perSideAngleDeg),
    },
    { field: 'chisel', headerName: 'Chisel', width: 110, valueGetter: (_value, row) => showLength(row.geometry.chiselWidthMm, units) },
    { field: 'headWeightG', headerName: 'Head', width: 100, valueGetter: (_value, row) => showMass(row.headWeightG, units) },
    { field: 'allowedFor', headerName: 'Who may use it', flex: 1, minWidth: 150, valueGetter: (_value, row) => USE_LABELS[row.allowedFor] },
    { field: 'maker', headerName: 'Maker', flex: 1, minWidth: 120 },
    { field: 'lastServicedOn', headerName: 'Last service', width: 120, valueGetter: (value: string | null) => value ?? '—' },
  ];
  return (
    <DataGrid
      rows={axes}
      columns={columns}
      autoHeight
      disableVirtualization
      disableRowSelectionOnClick
      disableColumnMenu
      getRowHeight={() => 'auto'}
      hideFooter={axes.length <= 50}
      initialState={{ sorting: { sortModel: [{ field: 'label', sort: 'asc' }] }, pagination: { paginationModel: { pageSize: 50 } } }}
      pageSizeOptions={[50, 100]}
      columnVisibilityModel={phone ? { bevel: false, chisel: false, headWeightG: false, allowedFor: false, maker: false, lastServicedOn: false } : {}}
      aria-label="Axes in the rack"
      sx={{ '& .MuiDataGrid-cell': { py: 1, whiteSpace: 'normal', overflowWrap: 'anywhere', display: 'flex', alignItems: 'center' } }}
    />
  );
}
