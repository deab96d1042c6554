import FormControl from '@mui/material/FormControl';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { useId, type ReactNode } from 'react';

export interface Choice<T extends string | number> {
  value: T;
  label: ReactNode;
  disabled?: boolean;
}

export interface ChoiceButtonsProps<T extends string | number> {
  label: string;
  choices: readonly Choice<T>[];
  value: T | null;
  onChange: (value: T | null) => void;
  /** One per row, full width: easier to hit with a thumb when the labels are long. */
  stacked?: boolean;
  error?: string | undefined;
  hint?: string | undefined;
}

/** A labelled row (or column) of large toggle buttons for one choice: a thumb beats a drop-down. */
export function ChoiceButtons<T extends string | number>({ label, choices, value, onChange, stacked = false, error, hint }: ChoiceButtonsProps<T>) {
  const labelId = useId();
  const hintId = useId();
  return (
    <FormControl error={Boolean(error)} component="fieldset" sx={{ border: 0, m: 0, p: 0, minWidth: 0 }}>
      <FormLabel id={labelId} component="legend" sx={{ mb: 1 }}>
        {label}
      </FormLabel>
      <ToggleButtonGroup
        exclusive
        color="primary"
        value={value}
        onChange={(_event, next: T | null) => onChange(next)}
        aria-labelledby={labelId}
        aria-describedby={error || hint ? hintId : undefined}
        orientation={stacked ? 'vertical' : 'horizontal'}
        fullWidth={stacked}
        sx={stacked ? undefined : { flexWrap: 'wrap' }}
      >
        {choices.map((choice) => (
          <ToggleButton key={String(choice.value)} value={choice.value} disabled={choice.disabled} sx={{ px: 2, justifyContent: stacked ? 'flex-start' : 'center', textAlign: 'left' }}>
            {choice.label}
          </ToggleButton>
        ))}
      </ToggleButtonGroup>
      {(error || hint) && <FormHelperText id={hintId}>{error ?? hint}</FormHelperText>}
    </FormControl>
  );
}
