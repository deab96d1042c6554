import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';

import type { TrialRankingRow, UnitPreference } from '../api/types.js';
import { formatDepth } from '../lib/depth-format.js';
import { releaseLabel } from '../lib/trial-words.js';
import { headText, RankingFlags, RankingNotes } from './ranking-list.js';

/**
 * The verdict as a table for wider screens (phones get RankingList). A plain table rather than a
 * data grid: it is a handful of rows.
 */
export function RankingTable({ rows, units }: { rows: TrialRankingRow[]; units: UnitPreference }) {
  return (
    <TableContainer>
      <Table size="small" aria-label="Ranking">
        <TableHead>
          <TableRow>
            <TableCell scope="col">Place</TableCell>
            <TableCell scope="col">Axe</TableCell>
            <TableCell scope="col" align="right">Depth a swing</TableCell>
            <TableCell scope="col" align="right">× reference</TableCell>
            <TableCell scope="col">Release</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {rows.map((row) => (
            <TableRow key={row.axeId}>
              <TableCell>{row.verdictPlace ?? '—'}</TableCell>
              <TableCell component="th" scope="row">
                <Typography variant="body2" sx={{ fontWeight: 600 }}>
                  {row.axeLabel}
                  {row.isReference && ' (reference)'}
                </Typography>
                <Typography variant="caption" color="text.secondary">
                  {headText(row)} · {row.testers.join(', ')}
                </Typography>
                <RankingFlags row={row} />
                <RankingNotes row={row} />
              </TableCell>
              <TableCell align="right">
                {row.meanMm === null ? '—' : formatDepth(row.meanMm, units)}
                <Typography variant="caption" color="text.secondary" component="div">
                  {row.counted} swing{row.counted === 1 ? '' : 's'}
                  {row.sdMm !== null && ` · ± ${formatDepth(row.sdMm, units)}`}
                </Typography>
              </TableCell>
              <TableCell align="right">{row.isReference ? '1.00' : row.ratioToReference === null ? '—' : row.ratioToReference.toFixed(2)}</TableCell>
              <TableCell>{releaseLabel(row.releaseStep)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
