import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link as RouterLink } from 'react-router';
import { z } from 'zod';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { PasswordField } from '../../../components/ui/password-field.js';
import { SubmitButton } from '../../../components/ui/submit-button.js';
import { paths } from '../../../config/paths.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { hasErrorCode } from '../../../lib/graphql-error-details.js';
import { authDocuments } from '../api/auth-documents.js';
import { MIN_PASSWORD_LENGTH, fieldRules } from '../schemas/field-rules.js';

const schema = z.object({ password: fieldRules.newPassword });
type Values = z.infer<typeof schema>;

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [resetPassword] = useMutation(authDocuments.resetPassword);
  const [alert, setAlert] = useState<string>();
  const [tokenRejected, setTokenRejected] = useState(false);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { password: '' },
  });

  const submit = handleSubmit(async ({ password }) => {
    setAlert(undefined);
    setTokenRejected(false);
    try {
      await resetPassword({ variables: { token, password } });
      onDone();
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: ['password'] }));
      setTokenRejected(hasErrorCode(error, 'TOKEN_INVALID'));
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5}>
      <FormAlert message={alert} />
      {tokenRejected && (
        <Link component={RouterLink} to={paths.auth.forgotPassword.href()}>
          Ask for a new reset link
        </Link>
      )}
      <PasswordField
        label="New password"
        autoComplete="new-password"
        helperText={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        registration={register('password')}
        fieldError={formState.errors.password}
      />
      <SubmitButton pending={formState.isSubmitting}>Set new password</SubmitButton>
    </Stack>
  );
}
