import Add from '@mui/icons-material/Add';
import Undo from '@mui/icons-material/Undo';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import FormControlLabel from '@mui/material/FormControlLabel';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { depthPerSwing } from '@endgrain/shared';
import { useRef, useState } from 'react';

import type { TrialSwing, UnitPreference } from '../../api/types.js';
import { formatDepth } from '../../lib/depth-format.js';
import { lengthInMm } from '../../lib/draft-to-input.js';
import { unitFor, type LengthUnit } from '../../lib/trial-draft.js';

export interface SwingPadProps {
  swings: TrialSwing[];
  units: UnitPreference;
  onChange: (swings: TrialSwing[]) => void;
}

/**
 * Swing by swing beside the block: a number pad, one big button, and the running figure. The
 * first stroke starts marked as an opening stroke (it lifts the first chip and is left out).
 */
export function SwingPad({ swings, units, onChange }: SwingPadProps) {
  const [unit, setUnit] = useState<LengthUnit>(unitFor(units));
  const [text, setText] = useState('');
  const [opening, setOpening] = useState(swings.length === 0);
  const [problem, setProblem] = useState<string>();
  const input = useRef<HTMLInputElement>(null);
  const summary = depthPerSwing(swings);

  const add = () => {
    const mm = lengthInMm(text, unit);
    if (mm === null || mm < 0 || mm > 400) {
      setProblem(`Type the depth of the swing in ${unit === 'in' ? 'inches' : 'millimetres'}, e.g. ${unit === 'in' ? '1.4' : '35'}.`);
      return;
    }
    onChange([...swings, { depthMm: Math.round(mm * 100) / 100, opening }]);
    setText('');
    setProblem(undefined);
    setOpening(false);
    input.current?.focus();
  };

  return (
    <Stack spacing={1.5} role="group" aria-label="Swings">
      <Typography variant="subtitle1" component="h3">
        Swings
      </Typography>
      {swings.length > 0 && (
        <Stack component="ol" direction="row" aria-label="Recorded swings" sx={{ flexWrap: 'wrap', gap: 1, p: 0, m: 0, listStyle: 'none' }}>
          {swings.map((s, i) => (
            <li key={i}>
              <Chip
                label={`${i + 1}. ${formatDepth(s.depthMm, units)}${s.opening ? ' (opening)' : ''}`}
                variant={s.opening ? 'outlined' : 'filled'}
                onClick={() => onChange(swings.map((x, j) => (j === i ? { ...x, opening: !x.opening } : x)))}
                onDelete={() => onChange(swings.filter((_x, j) => j !== i))}
                aria-label={`Swing ${i + 1}: ${formatDepth(s.depthMm, units)}${s.opening ? ', opening stroke' : ''}. Tap to switch opening stroke.`}
                sx={{ minHeight: 44 }}
              />
            </li>
          ))}
        </Stack>
      )}
      <Typography variant="body2" color="text.secondary" aria-live="polite">
        {summary.counted === 0
          ? 'No counted swing yet.'
          : `${summary.counted} counted${summary.openingExcluded ? `, ${summary.openingExcluded} opening left out` : ''} · ${formatDepth(summary.meanMm!, units)} a swing`}
      </Typography>
      <TextField
        inputRef={input}
        label={`Depth of swing ${swings.length + 1}`}
        value={text}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            add();
          }
        }}
        error={Boolean(problem)}
        helperText={problem}
        slotProps={{
          htmlInput: { inputMode: 'decimal', autoComplete: 'off', enterKeyHint: 'done' },
          input: {
            sx: { fontSize: '1.5rem' },
            endAdornment: (
              <InputAdornment position="end">
                <ToggleButtonGroup exclusive size="small" color="primary" aria-label="Depth unit" value={unit} onChange={(_e, next: LengthUnit | null) => next && setUnit(next)}>
                  <ToggleButton value="mm" aria-label="millimetres">mm</ToggleButton>
                  <ToggleButton value="in" aria-label="inches">in</ToggleButton>
                </ToggleButtonGroup>
              </InputAdornment>
            ),
          },
        }}
      />
      <FormControlLabel control={<Switch checked={opening} onChange={(e) => setOpening(e.target.checked)} />} label="Opening stroke (left out of the figures)" />
      <Button variant="contained" size="large" startIcon={<Add />} onClick={add} sx={{ minHeight: 56, fontSize: '1.1rem' }}>
        Add swing
      </Button>
      {swings.length > 0 && (
        <Button startIcon={<Undo />} onClick={() => onChange(swings.slice(0, -1))} sx={{ alignSelf: 'flex-start' }}>
          Remove swing {swings.length}
        </Button>
      )}
    </Stack>
  );
}
