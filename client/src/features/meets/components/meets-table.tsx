import Link from '@mui/material/Link';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import type { MeetSummary } from '../api/types.js';
import { formatDeadline } from '../lib/format-deadline.js';
import { formatMeetDate } from '../lib/format-meet-date.js';
import { MeetStatusChip } from './meet-status-chip.js';

const columns: GridColDef<MeetSummary>[] = [
  { field: 'startsOn', headerName: 'Date', width: 130, valueFormatter: (value: string) => formatMeetDate(value) },
  {
    field: 'name',
    headerName: 'Meet',
    flex: 2,
    minWidth: 180,
    renderCell: ({ row }) => (
      <Link component={RouterLink} to={paths.meet.href(row.id)}>
        {row.name}
      </Link>
    ),
  },
  { field: 'hostClubName', headerName: 'Host', flex: 1.2, minWidth: 140 },
  { field: 'venue', headerName: 'Venue', flex: 1, minWidth: 140 },
  { field: 'status', headerName: 'Status', width: 150, renderCell: ({ row }) => <MeetStatusChip status={row.status} /> },
  { field: 'entryDeadline', headerName: 'Entries close', width: 170, valueFormatter: (value: string) => formatDeadline(value) },
  { field: 'eventCount', headerName: 'Events', type: 'number', width: 76 },
  { field: 'entryCount', headerName: 'Entries', type: 'number', width: 80 },
];

/**
 * The organiser's and explorer's dense view of the meets list. A page holds at most 100 rows, so
 * every row is rendered (no virtualisation), which also keeps screen readers and jsdom whole.
 */
export function MeetsTable({ meets }: { meets: MeetSummary[] }) {
  return (
    <DataGrid
      rows={meets}
      columns={columns}
      autoHeight
      disableRowSelectionOnClick
      disableVirtualization
      hideFooter={meets.length <= 25}
      initialState={{ pagination: { paginationModel: { pageSize: 25 } } }}
      pageSizeOptions={[25, 50, 100]}
      aria-label="Meets"
    />
  );
}
