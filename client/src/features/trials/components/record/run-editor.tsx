import { RELEASE_SCALE } from '@endgrain/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';

import type { TrialAxeOption, UnitPreference } from '../../api/types.js';
import type { DraftRun, DraftTester } from '../../lib/trial-draft.js';
import { GRIND_WORDS, KEENNESS } from '../../lib/trial-words.js';
import { ChoiceButtons } from './choice-buttons.js';
import { SwingPad } from './swing-pad.js';

const RELEASE_CHOICES = RELEASE_SCALE.map((s) => ({ value: s.step as number, label: `${s.step} · ${s.label}` }));

export interface RunEditorProps {
  run: DraftRun;
  axes: TrialAxeOption[];
  testers: DraftTester[];
  /** The axe this run had when it was recorded: it stays offered even if it is out of use now. */
  recordedAxeId: string | null;
  units: UnitPreference;
  onSave: (run: DraftRun) => void;
  onCancel: () => void;
}

function axeLabel(axe: TrialAxeOption) {
  const bevel = axe.bevelIncludedDeg === null ? '' : ` · ${axe.bevelIncludedDeg}°`;
  return (
    <span>
      <strong>{axe.label}</strong> · {GRIND_WORDS[axe.grind]}
      {bevel}
      {!axe.usable && ' · out of use'}
    </span>
  );
}

/** One axe in one tester's hands: which axe, who, each swing, and how the bit came out. */
export function RunEditor({ run, axes, testers, recordedAxeId, units, onSave, onCancel }: RunEditorProps) {
  const [value, setValue] = useState<DraftRun>(run);
  const [missing, setMissing] = useState<string>();
  const set = (patch: Partial<DraftRun>) => setValue((v) => ({ ...v, ...patch }));
  const save = () => {
    if (!value.axeId || !value.testerId) {
      setMissing(!value.axeId ? 'Pick the axe on the block.' : 'Pick who is swinging.');
      return;
    }
    onSave(value);
  };
  return (
    <Stack component="section" spacing={3} aria-labelledby="run-editor-heading">
      <Typography id="run-editor-heading" variant="h2" sx={{ fontSize: '1.35rem' }}>
        Axe on the block
      </Typography>
      <ChoiceButtons
        label="Axe"
        stacked
        value={value.axeId || null}
        onChange={(axeId) => axeId && set({ axeId })}
        choices={axes.map((a) => ({ value: a.id, label: axeLabel(a), disabled: !a.usable && a.id !== recordedAxeId }))}
        hint={axes.some((a) => !a.usable) ? 'Axes with a loose head, a handle to replace or retired stay out of use.' : undefined}
      />
      <ChoiceButtons label="Tester" value={value.testerId || null} onChange={(testerId) => testerId && set({ testerId })} choices={testers.map((t) => ({ value: t.id, label: t.name }))} />
      <SwingPad swings={value.swings} units={units} onChange={(swings) => set({ swings })} />
      <ChoiceButtons label="How the bit comes out" stacked value={value.releaseStep} onChange={(releaseStep) => set({ releaseStep })} choices={RELEASE_CHOICES} hint="Steps 1 and 2 count as binding: a binding axe is placed after every axe that comes out free." />
      <ChoiceButtons label="Edge" value={value.keenness} onChange={(keenness) => set({ keenness })} choices={KEENNESS} />
      <TextField label="Feel" value={value.feel} onChange={(e) => set({ feel: e.target.value })} placeholder="e.g. bites deep and lets go" />
      <TextField label="Notes" value={value.notes} onChange={(e) => set({ notes: e.target.value })} multiline minRows={2} />
      {missing && (
        <Alert severity="error" role="alert">
          {missing}
        </Alert>
      )}
      <Stack direction="row" spacing={1.5}>
        <Button variant="contained" size="large" onClick={save} sx={{ flex: 1, minHeight: 56 }}>
          Save this axe
        </Button>
        <Button size="large" onClick={onCancel}>
          Cancel
        </Button>
      </Stack>
    </Stack>
  );
}
