import ButtonBase from '@mui/material/ButtonBase';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';

import type { GrainMap } from '../api/types.js';
import { effectColour, effectTextColour, effectWords } from '../lib/effect-colour.js';
import { sentenceCase } from '../../../lib/sentence-case.js';

export const LABEL_WORDS = { strong: 'strong', suggestive: 'suggestive', 'not-enough-data': 'not enough data' } as const;

export interface GrainMatrixTableProps {
  map: GrainMap;
  onOpen: (speciesId: string, grind: string) => void;
}

/** Species down, grinds across; each cell coloured by effect and always printing n and its label. */
export function GrainMatrixTable({ map, onOpen }: GrainMatrixTableProps) {
  return (
    <TableContainer sx={{ overflowX: 'auto' }}>
      <Table size="small" aria-label="Species by grind">
        <TableHead>
          <TableRow>
            <TableCell component="th">Species</TableCell>
            {map.grinds.map((g) => <TableCell key={g} component="th" align="center">{g}</TableCell>)}
          </TableRow>
        </TableHead>
        <TableBody>
          {map.species.map((s) => (
            <TableRow key={s.speciesId}>
              <TableCell component="th" scope="row">{sentenceCase(s.name)}</TableCell>
              {map.grinds.map((grind) => {
                const cells = map.cells.filter((c) => c.speciesId === s.speciesId && c.grind === grind);
                if (cells.length === 0) {
                  return (
                    <TableCell key={grind} align="center">
                      <Typography variant="caption" color="text.secondary">No results with this grind on this wood yet</Typography>
                    </TableCell>
                  );
                }
                const cell = cells[0]!;
                const shown = cell.label === 'not-enough-data' ? null : cell.effect;
                const words = cell.effect === null ? 'no repeat athletes' : cell.label === 'not-enough-data' ? `needs ${map.settings.minResults}+ results from ${map.settings.minAthletes}+ athletes` : cell.clearDifference ? effectWords(cell.effect) : 'no clear difference';
                return (
                  <TableCell key={grind} align="center" sx={{ p: 0.5 }}>
                    <ButtonBase
                      onClick={() => onOpen(s.speciesId, grind)}
                      aria-label={`${sentenceCase(s.name)}, ${grind}: ${words}, n = ${cell.results}, ${LABEL_WORDS[cell.label]}`}
                      sx={{ display: 'block', width: '100%', minHeight: 56, borderRadius: 1, p: 1, bgcolor: effectColour(shown), color: effectTextColour(shown), border: 1, borderColor: 'divider', borderStyle: cell.label === 'strong' ? 'solid' : 'dashed' }}
                    >
                      <Typography variant="body2" sx={{ fontWeight: 600 }}>{words}</Typography>
                      <Typography variant="caption" sx={{ display: "block" }}>n = {cell.results} · {cell.athletes} athletes · {LABEL_WORDS[cell.label]}</Typography>
                    </ButtonBase>
                  </TableCell>
                );
              })}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
