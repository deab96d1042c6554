import FormControl from '@mui/material/FormControl';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { useId } from 'react';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';

export interface ToggleFieldProps<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  /** Several may be on (a list value) instead of exactly one. */
  multiple?: boolean;
}

/** Large toggle buttons for a short fixed choice: quicker than a drop-down on a phone. */
export function ToggleField<T extends FieldValues>({ control, name, label, options, multiple = false }: ToggleFieldProps<T>) {
  const labelId = useId();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FormControl error={Boolean(fieldState.error)}>
          <FormLabel id={labelId} sx={{ mb: 1 }}>
            {label}
          </FormLabel>
          <ToggleButtonGroup
            aria-labelledby={labelId}
            color="primary"
            exclusive={!multiple}
            value={field.value}
            onChange={(_event, value: string | string[] | null) => {
              if (multiple || value !== null) field.onChange(value ?? []);
            }}
            sx={{ flexWrap: 'wrap' }}
          >
            {options.map((option) => (
              <ToggleButton key={option.value} value={option.value} sx={{ px: 2 }}>
                {option.label}
              </ToggleButton>
            ))}
          </ToggleButtonGroup>
          {fieldState.error && <FormHelperText>{fieldState.error.message}</FormHelperText>}
        </FormControl>
      )}
    />
  );
}
