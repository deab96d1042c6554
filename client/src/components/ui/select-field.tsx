import MenuItem from '@mui/material/MenuItem';
import TextField, { type TextFieldProps } from '@mui/material/TextField';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';

export interface SelectFieldProps<T extends FieldValues> extends Omit<TextFieldProps, 'name' | 'select' | 'value' | 'onChange' | 'error'> {
  control: Control<T>;
  name: Path<T>;
  options: ReadonlyArray<{ value: string; label: string; disabled?: boolean }>;
}

/** A labelled drop-down bound to react-hook-form; its error replaces the hint and focus can be sent to it. */
export function SelectField<T extends FieldValues>({ control, name, options, helperText, ...props }: SelectFieldProps<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          {...props}
          select
          name={field.name}
          value={field.value ?? ''}
          onChange={field.onChange}
          onBlur={field.onBlur}
          inputRef={field.ref}
          error={Boolean(fieldState.error)}
          helperText={fieldState.error?.message ?? helperText}
        >
          {options.map((option) => (
            <MenuItem key={option.value} value={option.value} disabled={option.disabled ?? false}>
              {option.label}
            </MenuItem>
          ))}
        </TextField>
      )}
    />
  );
}
