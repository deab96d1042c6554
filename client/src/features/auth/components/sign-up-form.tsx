import { zodResolver } from '@hookform/resolvers/zod';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { EmailField } from '../../../components/ui/email-field.js';
import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { PasswordField } from '../../../components/ui/password-field.js';
import { SubmitButton } from '../../../components/ui/submit-button.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import type { User } from '../api/types.js';
import { useAuth } from '../hooks/use-auth.js';
import { MIN_PASSWORD_LENGTH, fieldRules } from '../schemas/field-rules.js';

const schema = z.object({
  displayName: fieldRules.displayName,
  email: fieldRules.email,
  password: fieldRules.newPassword,
});
type Values = z.infer<typeof schema>;

export function SignUpForm({ onSignedUp }: { onSignedUp: (user: User) => void }) {
  const { signUp } = useAuth();
  const [alert, setAlert] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { displayName: '', email: '', password: '' },
  });
  const { errors, isSubmitting } = formState;

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    try {
      onSignedUp(await signUp(values));
    } catch (error) {
      setAlert(
        applyServerErrors(error, {
          setError,
          fields: ['displayName', 'email', 'password'],
          fieldForCode: { EMAIL_TAKEN: 'email' },
        }),
      );
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5}>
      <FormAlert message={alert} />
      <FormTextField
        label="Display name"
        autoComplete="nickname"
        helperText="Shown on results and rosters."
        registration={register('displayName')}
        fieldError={errors.displayName}
      />
      <EmailField
        helperText="We send a link to confirm it."
        registration={register('email')}
        fieldError={errors.email}
      />
      <PasswordField
        label="Password"
        autoComplete="new-password"
        helperText={`At least ${MIN_PASSWORD_LENGTH} characters; a short phrase is easier to remember than symbols.`}
        registration={register('password')}
        fieldError={errors.password}
      />
      <SubmitButton pending={isSubmitting}>Create account</SubmitButton>
    </Stack>
  );
}
