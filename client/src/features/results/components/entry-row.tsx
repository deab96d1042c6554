import { BLOCK_CONDITION_LABELS, BLOCK_CONDITIONS, HEAD_GRIND_LABELS, HEAD_GRINDS, POSTED_STATUS_LABELS, POSTED_STATUSES } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';

import type { MeetEventResults, RackAxe, Result, UnitPreference } from '../api/types.js';
import { chiselText, type DraftErrors, type EntryDraft } from '../lib/entry-draft.js';
import { markLabel, placeLabel, pointsLabel } from '../lib/format-result.js';
import { AxeField } from './axe-field.js';
import { CellField } from './cell-field.js';

export interface EntryRowProps {
  row: number;
  entry: { id: string; label: string; clubId: string; clubShortName: string };
  event: MeetEventResults;
  result: Result | undefined;
  draft: EntryDraft;
  dirty: boolean;
  saving: boolean;
  errors: DraftErrors;
  message: string | undefined;
  units: UnitPreference;
  onDraft(draft: EntryDraft): void;
  onSave(): void;
}

/** One entry of the results table: what was posted (editable) and what it earned (computed). */
export function EntryRow({ row, entry, event, result, draft, dirty, saving, errors, message, units, onDraft, onSave }: EntryRowProps) {
  const set = (change: Partial<EntryDraft>) => onDraft({ ...draft, ...change });
  const who = entry.label;
  const watches = event.resultKind === 'SCORED' ? 1 : 3;
  const pickAxe = (axe: RackAxe | null) =>
    set(axe
      ? {
          axeId: axe.id, axeLabel: axe.label, grind: axe.grind,
          bevel: axe.geometry.includedAngleDeg === null ? '' : String(axe.geometry.includedAngleDeg),
          chisel: axe.geometry.chiselWidthMm === null ? '' : chiselText(axe.geometry.chiselWidthMm, units),
        }
      : { axeId: '' });
  return (
    <Paper
      variant="outlined"
      role="group"
      aria-label={`Result of ${who}`}
      sx={{ p: 1.5, borderColor: message || Object.keys(errors).length ? 'error.main' : dirty ? 'secondary.main' : 'divider' }}
    >
      <Box sx={{ display: 'flex', gap: 1, alignItems: 'baseline', flexWrap: 'wrap', mb: 1 }}>
        <Typography sx={{ fontWeight: 700 }}>{who}</Typography>
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>{entry.clubShortName}</Typography>
        <Box sx={{ flexGrow: 1 }} />
        <Typography variant="body2" aria-label={`Computed for ${who}`} sx={{ fontVariantNumeric: 'tabular-nums' }}>
          {result ? `Place ${placeLabel(result)} · ${markLabel(result)} · ${pointsLabel(result.points)} pts` : 'No result yet'}
        </Typography>
      </Box>
      <Box sx={{ display: 'grid', gap: 1, gridTemplateColumns: { xs: 'repeat(2, minmax(0, 1fr))', sm: 'repeat(4, minmax(0, 1fr))', lg: 'repeat(8, minmax(0, 1fr))' } }}>
        {Array.from({ length: watches }, (_, i) => (
          <CellField
            key={i}
            column={`time${i}`}
            row={row}
            label={event.resultKind === 'TIMED' ? `Watch ${i + 1}` : `Time ${i + 1}`}
            value={draft.times[i]}
            problem={errors[`time${i}` as keyof DraftErrors]}
            onValue={(value) => set({ times: draft.times.map((t, k) => (k === i ? value : t)) as EntryDraft['times'] })}
            placeholder="m:ss.hh"
            slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `Watch ${i + 1} for ${who}` } }}
          />
        ))}
        {event.resultKind !== 'TIMED' && (
          <CellField column="score" row={row} label={event.resultKind === 'SCORED' ? 'Score' : 'Hits'} value={draft.score} problem={errors.score}
            onValue={(score) => set({ score })} slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `${event.resultKind === 'SCORED' ? 'Score' : 'Hits'} for ${who}` } }} />
        )}
        <CellField column="penalty" row={row} label="Penalty (s)" value={draft.penalty} problem={errors.penalty} onValue={(penalty) => set({ penalty })}
          slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `Penalty seconds for ${who}` } }} />
        <CellField select column="status" row={row} label="Status" value={draft.status} problem={errors.status}
          onValue={(status) => set({ status: status as EntryDraft['status'] })} slotProps={{ select: { native: true }, htmlInput: { 'aria-label': `Status for ${who}` } }}>
          {POSTED_STATUSES.map((status) => <option key={status} value={status}>{POSTED_STATUS_LABELS[status]}</option>)}
        </CellField>
        {draft.status === 'DISQUALIFIED' && (
          <CellField column="dqReason" row={row} label="DQ reason" value={draft.dqReason} problem={errors.dqReason} onValue={(dqReason) => set({ dqReason })}
            slotProps={{ htmlInput: { 'aria-label': `Disqualification reason for ${who}`, maxLength: 200 } }} sx={{ gridColumn: { xs: 'span 2' } }} />
        )}
        {event.usesHead && (
          <>
            <AxeField clubId={entry.clubId} row={row} label="Axe" value={draft.axeId} valueLabel={draft.axeLabel} problem={errors.axeId} onPick={pickAxe} />
            <CellField select column="grind" row={row} label="Grind" value={draft.grind} problem={errors.grind} onValue={(grind) => set({ grind: grind as EntryDraft['grind'] })}
              slotProps={{ select: { native: true }, htmlInput: { 'aria-label': `Grind for ${who}` } }}>
              <option value="">Not recorded</option>
              {HEAD_GRINDS.map((grind) => <option key={grind} value={grind}>{HEAD_GRIND_LABELS[grind]}</option>)}
            </CellField>
            <CellField column="bevel" row={row} label="Bevel (° incl.)" value={draft.bevel} problem={errors.bevel} onValue={(bevel) => set({ bevel })}
              slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `Included bevel angle for ${who}` } }} />
            <CellField column="chisel" row={row} label={`Chisel (${units === 'IMPERIAL' ? 'in' : 'mm'})`} value={draft.chisel} problem={errors.chisel} onValue={(chisel) => set({ chisel })}
              slotProps={{ htmlInput: { inputMode: 'decimal', 'aria-label': `Chisel width for ${who} in ${units === 'IMPERIAL' ? 'inches' : 'millimetres'}` } }} />
          </>
        )}
        {event.speciesId && (
          <CellField select column="condition" row={row} label="Block" value={draft.condition} problem={errors.condition}
            onValue={(condition) => set({ condition: condition as EntryDraft['condition'] })} slotProps={{ select: { native: true }, htmlInput: { 'aria-label': `Block condition for ${who}` } }}>
            <option value="">Not recorded</option>
            {BLOCK_CONDITIONS.map((c) => <option key={c} value={c}>{BLOCK_CONDITION_LABELS[c]}</option>)}
          </CellField>
        )}
        <Button variant={dirty ? 'contained' : 'outlined'} onClick={onSave} loading={saving} disabled={!dirty && !message} sx={{ minHeight: 44 }}
          aria-label={`Save the result of ${who}`}>
          {dirty ? 'Save' : 'Saved'}
        </Button>
      </Box>
      {message && <Typography role="alert" variant="body2" sx={{ color: 'error.main', mt: 1 }}>{message}</Typography>}
    </Paper>
  );
}
