import { DIVISION_LABELS } from '@endgrain/shared';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';

import type { DivisionStanding } from '../api/types.js';

const ORDINALS = ['1st', '2nd', '3rd'];

/** Club totals of one division: place, club, points and the event places the tie-break reads. */
export function StandingsTable({ standing, showMeets }: { standing: DivisionStanding; showMeets: boolean }) {
  return (
    <TableContainer>
      <Table size="small" aria-label={`${DIVISION_LABELS[standing.division]} standings`}>
        <TableHead>
          <TableRow>
            <TableCell>Place</TableCell>
            <TableCell>Club</TableCell>
            <TableCell align="right">Points</TableCell>
            {showMeets && <TableCell align="right">Meets</TableCell>}
            {ORDINALS.map((label) => (
              <TableCell key={label} align="right" sx={{ display: { xs: 'none', sm: 'table-cell' } }}>
                {label} places
              </TableCell>
            ))}
          </TableRow>
        </TableHead>
        <TableBody>
          {standing.clubs.map((club) => (
            <TableRow key={club.clubId}>
              <TableCell sx={{ fontWeight: 700 }}>{`${club.place}${club.tied ? '=' : ''}`}</TableCell>
              <TableCell>{club.clubName}</TableCell>
              <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>{club.points}</TableCell>
              {showMeets && <TableCell align="right">{club.meets}</TableCell>}
              {ORDINALS.map((label, index) => (
                <TableCell key={label} align="right" sx={{ display: { xs: 'none', sm: 'table-cell' } }}>
                  {club.placeCounts[index] ?? 0}
                </TableCell>
              ))}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
