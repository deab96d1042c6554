import { FormTextField, type FormTextFieldProps } from './form-text-field.js';

/** The "Email" input every account form asks for, with the phone's e-mail keyboard and autofill. */
export function EmailField(props: Omit<FormTextFieldProps, 'label' | 'type' | 'autoComplete'>) {
  return <FormTextField {...props} label="Email" type="email" autoComplete="email" />;
}
