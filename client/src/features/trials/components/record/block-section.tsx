import { listSpecies } from '@endgrain/shared';
import IconButton from '@mui/material/IconButton';
import InputAdornment from '@mui/material/InputAdornment';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';

import type { TrialSetup } from '../../api/types.js';
import { isFreezing, type DraftProblem } from '../../lib/draft-to-input.js';
import type { LengthUnit, TrialDraft } from '../../lib/trial-draft.js';
import { CONDITIONS, GRIND_WORDS } from '../../lib/trial-words.js';
import { FrozenWoodNote } from '../frozen-wood-note.js';
import { ChoiceButtons } from './choice-buttons.js';
import { TestersField } from './testers-field.js';
import { sentenceCase } from '../../../../lib/sentence-case.js';

const SPECIES = listSpecies();

export interface BlockSectionProps {
  draft: TrialDraft;
  setup: TrialSetup;
  problems: readonly DraftProblem[];
  onChange: (patch: Partial<TrialDraft>) => void;
}

/** The block and the people: everything a trial shares before the first axe is swung (the recorder gives it its heading). */
export function BlockSection({ draft, setup, problems, onChange }: BlockSectionProps) {
  const hint = (field: DraftProblem['field']) => problems.find((p) => p.field === field)?.message;
  const testersWithRuns = new Set(draft.runs.map((r) => r.testerId));
  // An axe out of use can stay the reference of an older trial, but is not offered for a new one.
  const references = setup.axes.filter((a) => a.usable || a.id === draft.referenceAxeId);
  const flipSign = () => {
    const text = draft.airTempText.trim();
    onChange({ airTempText: text.startsWith('-') ? text.slice(1) : `-${text}` });
  };
  return (
    <Stack spacing={2.5}>
      <TextField label="Test date" type="date" value={draft.testedOn} onChange={(e) => onChange({ testedOn: e.target.value })} helperText={hint('testedOn')} slotProps={{ inputLabel: { shrink: true } }} />
      <TextField select label="Species" value={draft.speciesId} onChange={(e) => onChange({ speciesId: e.target.value })} helperText={hint('speciesId')}>
        {SPECIES.map((s) => (
          <MenuItem key={s.id} value={s.id}>
            {sentenceCase(s.commonName)}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        label="Block diameter"
        value={draft.diameterText}
        onChange={(e) => onChange({ diameterText: e.target.value })}
        helperText={hint('diameter')}
        slotProps={{
          htmlInput: { inputMode: 'decimal', autoComplete: 'off' },
          input: {
            endAdornment: (
              <InputAdornment position="end">
                <ToggleButtonGroup exclusive size="small" color="primary" aria-label="Diameter unit" value={draft.diameterUnit} onChange={(_e, unit: LengthUnit | null) => unit && onChange({ diameterUnit: unit })}>
                  <ToggleButton value="mm" aria-label="millimetres">mm</ToggleButton>
                  <ToggleButton value="in" aria-label="inches">in</ToggleButton>
                </ToggleButtonGroup>
              </InputAdornment>
            ),
          },
        }}
      />
      <ChoiceButtons label="Condition" choices={CONDITIONS} value={draft.condition} onChange={(condition) => condition && onChange({ condition })} hint={hint('condition')} />
      <TextField
        label="Air temperature (°C, optional)"
        value={draft.airTempText}
        onChange={(e) => onChange({ airTempText: e.target.value })}
        helperText={hint('airTemp') ?? 'Phone keypads often have no minus sign: use ± for below zero.'}
        slotProps={{
          htmlInput: { inputMode: 'decimal', autoComplete: 'off' },
          input: {
            endAdornment: (
              <InputAdornment position="end">
                <IconButton aria-label="Below zero: change the sign" onClick={flipSign} edge="end">
                  ±
                </IconButton>
              </InputAdornment>
            ),
          },
        }}
      />
      {isFreezing(draft) && <FrozenWoodNote />}
      <TextField label="Knots noted" value={draft.knots} onChange={(e) => onChange({ knots: e.target.value })} placeholder="e.g. one pin knot low on the back" />
      <TextField label="Face used" value={draft.faceUsed} onChange={(e) => onChange({ faceUsed: e.target.value })} placeholder="e.g. north face, top half" />
      <TextField
        select
        label="Reference axe"
        value={draft.referenceAxeId}
        onChange={(e) => onChange({ referenceAxeId: e.target.value })}
        helperText={hint('referenceAxeId') ?? 'Every axe on the block is compared with this one.'}
      >
        {references.length === 0 && <MenuItem disabled value="">The rack has no axe in use</MenuItem>}
        {references.map((a) => (
          <MenuItem key={a.id} value={a.id}>
            {a.label} · {GRIND_WORDS[a.grind]}
            {a.bevelIncludedDeg !== null ? ` ${a.bevelIncludedDeg}°` : ''}
          </MenuItem>
        ))}
      </TextField>
      <TestersField
        testers={draft.testers}
        athletes={setup.athletes}
        locked={testersWithRuns}
        hint={hint('testers')}
        onChange={(testers) => onChange({ testers })}
      />
      <TextField label="Notes on the trial" value={draft.notes} onChange={(e) => onChange({ notes: e.target.value })} multiline minRows={2} />
    </Stack>
  );
}
