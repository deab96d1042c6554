import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { EmailField } from '../../../components/ui/email-field.js';
import { FormAlert } from '../../../components/ui/form-alert.js';
import { SubmitButton } from '../../../components/ui/submit-button.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { authDocuments } from '../api/auth-documents.js';
import { fieldRules } from '../schemas/field-rules.js';

const schema = z.object({ email: fieldRules.email });
type Values = z.infer<typeof schema>;

export function ForgotPasswordForm() {
  const [requestReset] = useMutation(authDocuments.requestPasswordReset);
  const [sentTo, setSentTo] = useState<string>();
  const [alert, setAlert] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { email: '' },
  });

  const submit = handleSubmit(async ({ email }) => {
    setAlert(undefined);
    try {
      await requestReset({ variables: { email } });
      setSentTo(email);
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: ['email'] }));
    }
  });

  if (sentTo) {
    // The server answers the same whether or not the address has an account, and so do we.
    return (
      <Alert severity="success" role="status">
        If an account uses {sentTo}, a link to set a new password is on its way. Check your inbox, and the spam
        folder if nothing arrives in a few minutes.
      </Alert>
    );
  }

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5}>
      <FormAlert message={alert} />
      <EmailField
        registration={register('email')}
        fieldError={formState.errors.email}
      />
      <SubmitButton pending={formState.isSubmitting}>Send reset link</SubmitButton>
    </Stack>
  );
}
