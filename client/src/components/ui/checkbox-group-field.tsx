import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';

export interface CheckboxGroupFieldProps<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
}

/** Several ticks that make one list value (divisions), with the list's error under it. */
export function CheckboxGroupField<T extends FieldValues>({ control, name, label, options }: CheckboxGroupFieldProps<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const picked: string[] = field.value ?? [];
        return (
          <FormControl component="fieldset" error={Boolean(fieldState.error)}>
            <FormLabel component="legend">{label}</FormLabel>
            <FormGroup row>
              {options.map((option, index) => (
                <FormControlLabel
                  key={option.value}
                  sx={{ minHeight: 44 }}
                  label={option.label}
                  control={
                    <Checkbox
                      slotProps={{ input: { ref: index === 0 ? field.ref : undefined } }}
                      checked={picked.includes(option.value)}
                      onChange={(_event, checked) =>
                        field.onChange(checked ? [...picked, option.value] : picked.filter((value) => value !== option.value))
                      }
                      onBlur={field.onBlur}
                    />
                  }
                />
              ))}
            </FormGroup>
            {fieldState.error && <FormHelperText>{fieldState.error.message}</FormHelperText>}
          </FormControl>
        );
      }}
    />
  );
}
