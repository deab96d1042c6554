import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

import type { TrialRankingRow, UnitPreference } from '../api/types.js';
import { formatDepth } from '../lib/depth-format.js';
import { FLAG_WORDS, GRIND_WORDS, releaseLabel } from '../lib/trial-words.js';

export function headText(row: TrialRankingRow): string {
  if (!row.head) return '';
  const bevel = row.head.bevelIncludedDeg === null ? '' : ` ${row.head.bevelIncludedDeg}°`;
  return `${GRIND_WORDS[row.head.grind]}${bevel}`;
}

export function ratioText(row: TrialRankingRow): string {
  if (row.isReference) return 'reference';
  return row.ratioToReference === null ? 'no ratio' : `${row.ratioToReference.toFixed(2)}× the reference`;
}

export function RankingFlags({ row }: { row: TrialRankingRow }) {
  if (row.flags.length === 0) return null;
  return (
    <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 0.5, mt: 0.5 }}>
      {row.flags.map((flag) => (
        <Chip key={flag} size="small" label={FLAG_WORDS[flag]} color={flag === 'BINDS' || flag === 'PLACED_AFTER_RELEASING_AXES' ? 'warning' : 'default'} />
      ))}
    </Stack>
  );
}

/** The caveats the verdict wrote for a row (e.g. a tester who did not swing the reference axe). */
export function RankingNotes({ row }: { row: TrialRankingRow }) {
  return row.notes.map((note) => (
    <Typography key={note} variant="caption" component="p" sx={{ mt: 0.5 }}>
      {note}
    </Typography>
  ));
}

/** The verdict on a phone: one card per place, every figure on it, nothing to scroll sideways. */
export function RankingList({ rows, units }: { rows: TrialRankingRow[]; units: UnitPreference }) {
  return (
    <Stack component="ol" spacing={1} aria-label="Ranking" sx={{ p: 0, m: 0, listStyle: 'none' }}>
      {rows.map((row) => (
        <Paper component="li" key={row.axeId} variant="outlined" sx={{ p: 1.5, display: 'flex', gap: 1.5 }}>
          <Typography component="span" sx={{ fontSize: '1.6rem', fontWeight: 700, minWidth: '1.6em', lineHeight: 1.1 }} aria-label={row.verdictPlace === null ? 'No place' : `Place ${row.verdictPlace}`}>
            {row.verdictPlace ?? '—'}
          </Typography>
          <div>
            <Typography sx={{ fontWeight: 600 }}>
              {row.axeLabel}
              {row.isReference && ' (reference)'}
            </Typography>
            <Typography variant="body2">
              {row.meanMm === null ? 'no counted swing' : `${formatDepth(row.meanMm, units)} a swing`} · {ratioText(row)}
            </Typography>
            <Typography variant="body2" color="text.secondary">
              {row.counted} counted{row.sdMm !== null && ` (± ${formatDepth(row.sdMm, units)})`} · release {releaseLabel(row.releaseStep)} · {headText(row)} · {row.testers.join(', ')}
            </Typography>
            <RankingFlags row={row} />
            <RankingNotes row={row} />
          </div>
        </Paper>
      ))}
    </Stack>
  );
}
