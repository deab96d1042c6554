import { zodResolver } from '@hookform/resolvers/zod';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { EmailField } from '../../../components/ui/email-field.js';
import { FormAlert } from '../../../components/ui/form-alert.js';
import { PasswordField } from '../../../components/ui/password-field.js';
import { SubmitButton } from '../../../components/ui/submit-button.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import type { User } from '../api/types.js';
import { useAuth } from '../hooks/use-auth.js';
import { fieldRules } from '../schemas/field-rules.js';

const schema = z.object({ email: fieldRules.email, password: fieldRules.currentPassword });
type Values = z.infer<typeof schema>;

export function SignInForm({ onSignedIn }: { onSignedIn: (user: User) => void }) {
  const { signIn } = useAuth();
  const [alert, setAlert] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { email: '', password: '' },
  });
  const { errors, isSubmitting } = formState;

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    try {
      onSignedIn(await signIn(values));
    } catch (error) {
      // INVALID_CREDENTIALS and TOO_MANY_ATTEMPTS name no field: they go in the alert.
      setAlert(applyServerErrors(error, { setError, fields: ['email', 'password'] }));
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5}>
      <FormAlert message={alert} />
      <EmailField
        registration={register('email')}
        fieldError={errors.email}
      />
      <PasswordField
        label="Password"
        autoComplete="current-password"
        registration={register('password')}
        fieldError={errors.password}
      />
      <SubmitButton pending={isSubmitting}>Sign in</SubmitButton>
    </Stack>
  );
}
