import { DIVISION_LABELS, formatLength, formatTime, type Division } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import GlobalStyles from '@mui/material/GlobalStyles';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

import { SafetyNote } from '../../../components/ui/safety-note.js';
import type { HandicapMark, HandicapMarkInput, HandicapSheet } from '../api/handicap-types.js';

const FLAG_WORDS: Record<string, string> = { 'thin-history': 'Thin history: check by hand', 'no-history': 'No history: set a mark by judgement' };

// On paper the sheet keeps the marks and the cautions; the app's bars, edit fields and buttons are left off.
const PRINT = {
  '@media print': {
    '.MuiAppBar-root, nav, .handicap-screen-only': { display: 'none !important' },
    '.handicap-print-only': { display: 'block !important' },
    'table': { fontSize: '10pt' },
  },
};

// On a phone each athlete's row becomes a small stacked card, so nothing is squeezed into slivers.
const STACKED = {
  '& thead': { display: { xs: 'none', md: 'table-header-group' } },
  '& tr': { display: { xs: 'grid', md: 'table-row' }, gap: 0.5, py: { xs: 1.5, md: 0 }, borderBottom: { xs: 1, md: 0 }, borderColor: 'divider' },
  '& td, & tbody th': { display: { xs: 'block', md: 'table-cell' }, '@media (max-width: 899.95px)': { border: 0, textAlign: 'left', py: 0 } },
  '@media print': { '& thead': { display: 'table-header-group' }, '& tr': { display: 'table-row' }, '& td, & tbody th': { display: 'table-cell', borderBottom: '1px solid #999' } },
};
const phoneOnly = { display: { xs: 'inline', md: 'none' } };

export interface HandicapSheetViewProps {
  sheet: HandicapSheet;
  imperial: boolean;
  saving: boolean;
  onSave: (marks: HandicapMarkInput[]) => void;
}

/** Working behind each suggested mark, the organiser's own marks and a printable start sheet. */
export function HandicapSheetView({ sheet, imperial, saving, onSave }: HandicapSheetViewProps) {
  const [typed, setTyped] = useState<Record<string, string>>(() => Object.fromEntries(sheet.marks.map((m) => [m.athleteId, m.overrideSeconds === null ? '' : String(m.overrideSeconds)])));
  const bad = (text: string) => text.trim() !== '' && !/^\d{1,3}$/.test(text.trim());
  const invalid = Object.values(typed).some(bad);
  const save = () => onSave(sheet.marks.map((m) => ({ athleteId: m.athleteId, markSeconds: typed[m.athleteId]?.trim() ? Number(typed[m.athleteId]) : null, note: m.overrideNote || null })));
  const block = formatLength(sheet.blockDiameterMm, imperial ? 'imperial' : 'metric', { digits: imperial ? 1 : 0 });
  return (
    <Stack spacing={2}>
      <GlobalStyles styles={PRINT} />
      <Typography>{sheet.eventName}, {DIVISION_LABELS[sheet.division as Division] ?? sheet.division} · block {block} · {sheet.convention}</Typography>
      <Typography variant="body2" color="text.secondary">{sheet.note}</Typography>
      <Box sx={STACKED}>
        <Table size="small" aria-label="Handicap marks">
          <TableHead>
            <TableRow>
              <TableCell component="th">Athlete</TableCell>
              <TableCell component="th">Expected time</TableCell>
              <TableCell component="th">Data behind it</TableCell>
              <TableCell component="th" align="right">Suggested mark (s)</TableCell>
              <TableCell component="th" align="right">Mark (s)</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {sheet.marks.map((m) => (
              <MarkRow key={m.athleteId} mark={m} imperial={imperial} value={typed[m.athleteId] ?? ''} error={bad(typed[m.athleteId] ?? '')} onChange={(v) => setTyped((t) => ({ ...t, [m.athleteId]: v }))} />
            ))}
          </TableBody>
        </Table>
      </Box>
      {sheet.marks.length === 0 && <Typography>No athletes are entered in this event yet. Add entries on the meet page, then come back for their marks.</Typography>}
      <Button className="handicap-screen-only" variant="contained" onClick={save} disabled={saving || invalid || sheet.marks.length === 0} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
        {saving ? 'Saving…' : 'Save marks'}
      </Button>
      <Button className="handicap-screen-only" variant="outlined" onClick={() => window.print()} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>Print the start sheet</Button>
      <SafetyNote title="Meet-day safety">
        Starters call each mark aloud and no athlete mounts or swings before their mark. Keep the chopping area clear and guards on every axe not in use; boots and shin guards on the stand.
        These marks are suggestions from past times: the meet referee and the sanctioning body&apos;s rules decide, and local law and qualified coaching come first.
      </SafetyNote>
    </Stack>
  );
}

interface MarkRowProps {
  mark: HandicapMark;
  imperial: boolean;
  value: string;
  error: boolean;
  onChange: (value: string) => void;
}

function MarkRow({ mark, imperial, value, error, onChange }: MarkRowProps) {
  const length = (mm: number) => formatLength(mm, imperial ? 'imperial' : 'metric', { digits: imperial ? 1 : 0 });
  return (
    <TableRow>
      <TableCell component="th" scope="row">
        {mark.athleteName}
        {mark.flags.map((f) => <Chip key={f} size="small" color="warning" label={FLAG_WORDS[f] ?? f} sx={{ ml: 1 }} />)}
      </TableCell>
      <TableCell><Box component="span" sx={phoneOnly}>Expected time </Box>{mark.expectedHundredths === null ? 'no past times' : formatTime(Math.round(mark.expectedHundredths))}</TableCell>
      <TableCell>
        <Typography variant="body2">{mark.n} past {mark.n === 1 ? 'time' : 'times'}</Typography>
        {mark.used.map((u) => (
          <Typography key={`${u.date}-${u.meetName}-${u.hundredths}`} variant="caption" sx={{ display: 'block' }}>
            {u.date} {u.meetName}: {formatTime(u.hundredths)} on {length(u.diameterMm)} → {formatTime(Math.round(u.onBlockHundredths))}
          </Typography>
        ))}
      </TableCell>
      <TableCell align="right"><Box component="span" sx={phoneOnly}>Suggested mark (s) </Box>{mark.suggestedSeconds ?? '—'}</TableCell>
      <TableCell align="right">
        <TextField
          className="handicap-screen-only"
          size="small"
          label={`Mark for ${mark.athleteName}`}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          placeholder={mark.suggestedSeconds === null ? '' : String(mark.suggestedSeconds)}
          error={error}
          helperText={error ? 'Whole seconds, 0–999' : value ? 'your mark' : 'blank keeps the suggestion'}
          slotProps={{ htmlInput: { inputMode: 'numeric', style: { minHeight: 28 } } }}
          sx={{ width: { xs: '100%', md: 170 } }}
        />
        <Box className="handicap-print-only" sx={{ display: 'none' }}>{value.trim() || (mark.markSeconds ?? '—')}</Box>
      </TableCell>
    </TableRow>
  );
}
