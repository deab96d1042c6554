import TextField, { type TextFieldProps } from '@mui/material/TextField';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';

export interface FormTextFieldProps extends Omit<TextFieldProps, 'name' | 'error' | 'onChange' | 'onBlur'> {
  registration: UseFormRegisterReturn;
  fieldError?: FieldError | undefined;
}

/** A labelled MUI text field wired to react-hook-form; the field's error replaces its hint. */
export function FormTextField({ registration, fieldError, helperText, slotProps, ...props }: FormTextFieldProps) {
  const { ref, ...field } = registration;
  return (
    <TextField
      {...props}
      {...field}
      inputRef={ref}
      error={Boolean(fieldError)}
      helperText={fieldError?.message ?? helperText}
      slotProps={{
        ...slotProps,
        htmlInput: { 'aria-invalid': Boolean(fieldError), ...(slotProps?.htmlInput as object | undefined) },
      }}
    />
  );
}
