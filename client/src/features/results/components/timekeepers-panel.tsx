import { useMutation, useQuery } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { ConfirmDialog } from '../../../components/ui/confirm-dialog.js';
import { EmailField } from '../../../components/ui/email-field.js';
import { FormAlert } from '../../../components/ui/form-alert.js';
import { SectionCard } from '../../../components/ui/section-card.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { resultsDocuments as docs } from '../api/results-documents.js';
import type { MeetTimekeeper } from '../api/types.js';

const schema = z.object({
  email: z.string().trim().min(1, 'Enter the timekeeper’s e-mail address.').pipe(z.email({ error: 'That does not look like an e-mail address.' })),
});
type Values = z.infer<typeof schema>;

/** For organisers: who else may post this meet's results until they are published. */
export function TimekeepersPanel({ meetId }: { meetId: string }) {
  const { data, loading, error } = useQuery(docs.meetTimekeepers, { variables: { meetId } });
  // Both answer with the whole list: it replaces the cached one.
  const [appoint] = useMutation(docs.appointTimekeeper, {
    update: (cache, { data: answer }) => answer && cache.writeQuery({ query: docs.meetTimekeepers, variables: { meetId }, data: { meetTimekeepers: answer.appointTimekeeper } }),
  });
  const [remove] = useMutation(docs.removeTimekeeper, {
    update: (cache, { data: answer }) => answer && cache.writeQuery({ query: docs.meetTimekeepers, variables: { meetId }, data: { meetTimekeepers: answer.removeTimekeeper } }),
  });
  const [alert, setAlert] = useState<string>();
  const [done, setDone] = useState<string>();
  const [removing, setRemoving] = useState<MeetTimekeeper>();
  const { register, handleSubmit, setError, reset, formState } = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { email: '' } });

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    setDone(undefined);
    try {
      const result = await appoint({ variables: { meetId, email: values.email } });
      const list = result.data?.appointTimekeeper ?? [];
      const added = list.find((t) => t.email === values.email.trim().toLowerCase());
      setDone(`${added?.displayName ?? values.email} can now post this meet's results.`);
      reset({ email: '' });
    } catch (e) {
      setAlert(applyServerErrors(e, { setError, fields: ['email'] }));
    }
  });
  const timekeepers = data?.meetTimekeepers ?? [];
  return (
    <SectionCard title="Timekeepers">
      <Stack spacing={2}>
        <Typography sx={{ color: 'text.secondary' }}>
          Timekeepers post and upload this meet's results until they are published. Publishing and corrections stay with organisers.
        </Typography>
        {loading && !data && <Typography sx={{ color: 'text.secondary' }}>Loading timekeepers…</Typography>}
        {error && <Alert severity="error">{error.message}</Alert>}
        {data && timekeepers.length === 0 && <Typography>No timekeepers yet: only organisers post results.</Typography>}
        {timekeepers.length > 0 && (
          <List dense disablePadding aria-label="Timekeepers for this meet">
            {timekeepers.map((t) => (
              <ListItem
                key={t.userId}
                disableGutters
                divider
                secondaryAction={<Button color="error" onClick={() => setRemoving(t)} aria-label={`Remove ${t.displayName}`} sx={{ minHeight: 44 }}>Remove</Button>}
                // Room for the Remove button; long addresses wrap instead of running under it.
                sx={{ pr: 12 }}
              >
                <ListItemText primary={t.displayName} secondary={t.email} slotProps={{ secondary: { sx: { overflowWrap: 'anywhere' } } }} />
              </ListItem>
            ))}
          </List>
        )}
        <Stack component="form" noValidate onSubmit={submit} spacing={1.5} sx={{ maxWidth: 520 }} aria-label="Appoint a timekeeper">
          <FormAlert message={alert} />
          {done && <Alert severity="success" role="status">{done}</Alert>}
          <EmailField registration={register('email')} fieldError={formState.errors.email} helperText="They need an Endgrain account; ask them to sign up first." />
          <Button type="submit" variant="outlined" loading={formState.isSubmitting} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
            Appoint timekeeper
          </Button>
        </Stack>
      </Stack>
      <ConfirmDialog
        open={Boolean(removing)}
        title={`Remove ${removing?.displayName ?? ''}?`}
        confirmLabel="Remove"
        destructive
        onClose={() => setRemoving(undefined)}
        onConfirm={async () => {
          if (!removing) return;
          await remove({ variables: { meetId, userId: removing.userId } });
          setDone(`${removing.displayName} no longer posts this meet's results. Appoint them again to undo.`);
          setRemoving(undefined);
        }}
      >
        They will no longer be able to post or upload this meet's results. Results they already posted stay.
      </ConfirmDialog>
    </SectionCard>
  );
}
