import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { EmailField } from '../../../components/ui/email-field.js';
import { FormAlert } from '../../../components/ui/form-alert.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import { ToggleField } from '../../../components/ui/toggle-field.js';

const schema = z.object({
  email: z.string().trim().min(1, 'Enter their e-mail address.').pipe(z.email({ error: 'That does not look like an e-mail address.' })),
  role: z.enum(['ATHLETE', 'COACH']),
});
type Values = z.infer<typeof schema>;

/** E-mails a one-time link that lets someone sign up or sign in and join the club. */
export function InviteForm({ clubId, clubName }: { clubId: string; clubName: string }) {
  const [alert, setAlert] = useState<string>();
  const [sent, setSent] = useState<string>();
  const [invite] = useMutation(clubsDocuments.inviteToClub, {
    refetchQueries: [{ query: clubsDocuments.clubInvitations, variables: { clubId } }],
  });
  const { register, control, handleSubmit, setError, reset, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { email: '', role: 'ATHLETE' },
  });
  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    setSent(undefined);
    try {
      const { data } = await invite({ variables: { input: { clubId, ...values } } });
      setSent(`Invitation sent to ${data?.inviteToClub.email ?? values.email}. The link works once, for 14 days.`);
      reset({ email: '', role: values.role });
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: ['email', 'role'] }));
    }
  });
  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2} sx={{ maxWidth: 520 }}>
      <FormAlert message={alert} />
      {sent && (
        <Alert severity="success" role="status">
          {sent}
        </Alert>
      )}
      <EmailField registration={register('email')} fieldError={formState.errors.email} helperText={`They join ${clubName} once they open the link.`} />
      <ToggleField control={control} name="role" label="Joins as" options={[{ value: 'ATHLETE', label: 'Athlete' }, { value: 'COACH', label: 'Coach' }]} />
      <Button type="submit" variant="contained" loading={formState.isSubmitting} sx={{ alignSelf: 'flex-start' }}>
        Send invitation
      </Button>
    </Stack>
  );
}
