import { DIVISION_LABELS, EXPERIENCE_LABELS } from '@endgrain/shared';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { Athlete } from '../api/types.js';

export interface RosterGridProps {
  roster: Athlete[];
  /** Present for the club's coaches: an Edit button per row. */
  onEdit?: (athlete: Athlete) => void;
}

/**
 * The roster as a table. On a phone only name, divisions and the edit button stay; every row is
 * rendered (rosters are small), which keeps screen readers and jsdom whole.
 */
export function RosterGrid({ roster, onEdit }: RosterGridProps) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const columns: GridColDef<Athlete>[] = [
    {
      field: 'name',
      headerName: 'Name',
      flex: 1.2,
      minWidth: 120,
      valueGetter: (_value, row) => `${row.lastName}, ${row.firstName}`,
      renderCell: ({ row }) => (
        <Link component={RouterLink} to={paths.athlete.href(row.id)}>
          {row.name}
        </Link>
      ),
    },
    {
      field: 'divisions',
      headerName: 'Divisions',
      flex: 1,
      minWidth: 100,
      sortable: false,
      valueGetter: (_value, row) => row.divisions.map((division) => DIVISION_LABELS[division]).join(', '),
    },
    { field: 'experience', headerName: 'Experience', width: 130, valueGetter: (_value, row) => EXPERIENCE_LABELS[row.experience] },
    { field: 'firstSeasonYear', headerName: 'First season', width: 120, valueGetter: (value: number | null) => value ?? '—' },
    { field: 'hasAccount', headerName: 'Account', width: 110, valueGetter: (value: boolean) => (value ? 'Linked' : 'None') },
  ];
  if (onEdit) {
    columns.push({
      field: 'actions',
      headerName: '',
      width: 72,
      sortable: false,
      renderCell: ({ row }) => (
        <Button size="small" onClick={() => onEdit(row)} aria-label={`Edit ${row.name}`}>
          Edit
        </Button>
      ),
    });
  }
  return (
    <DataGrid
      rows={roster}
      columns={columns}
      autoHeight
      disableVirtualization
      disableRowSelectionOnClick
      disableColumnMenu
      getRowHeight={() => 'auto'}
      hideFooter={roster.length <= 50}
      initialState={{ sorting: { sortModel: [{ field: 'name', sort: 'asc' }] }, pagination: { paginationModel: { pageSize: 50 } } }}
      pageSizeOptions={[50, 100]}
      columnVisibilityModel={phone ? { experience: false, firstSeasonYear: false, hasAccount: false } : {}}
      aria-label="Roster"
      // Long names and division lists wrap instead of being cut off on a phone.
      sx={{ '& .MuiDataGrid-cell': { py: 1, whiteSpace: 'normal', overflowWrap: 'anywhere', display: 'flex', alignItems: 'center' } }}
    />
  );
}
