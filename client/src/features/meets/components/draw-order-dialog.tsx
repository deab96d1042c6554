import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { MeetEvent } from '../api/types.js';
import { eventTitle } from '../lib/event-title.js';
import { FormDialog } from '../../../components/ui/form-dialog.js';

// Limits from the server (server/src/meets/meet-events.service.ts).
const schema = z.object({
  heatSize: z.string().refine((text) => /^\d+$/.test(text.trim()) && Number(text) >= 1 && Number(text) <= 50, 'Heat size must be a whole number from 1 to 50.'),
  seed: z.string().refine((text) => text.trim() === '' || (/^\d+$/.test(text.trim()) && Number(text) >= 1 && Number(text) < 2 ** 32), 'A seed is a whole number from 1 to 4294967295.'),
});
type Values = z.infer<typeof schema>;

export interface DrawOrderDialogProps {
  event: MeetEvent;
  onClose: () => void;
  onDrawn: (message: string) => void;
}

/** Draws the order of competition and heats; a stored seed can be given again to reproduce a draw. */
export function DrawOrderDialog({ event, onClose, onDrawn }: DrawOrderDialogProps) {
  const [alert, setAlert] = useState<string>();
  const [draw] = useMutation(meetsDocuments.drawOrder, {
    refetchQueries: [{ query: meetsDocuments.meet, variables: { id: event.meetId } }],
    awaitRefetchQueries: true,
  });
  const { register, handleSubmit, setError, setValue, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { heatSize: String(event.heatSize ?? 4), seed: '' },
  });

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    try {
      const seed = values.seed.trim() === '' ? null : Number(values.seed);
      const { data } = await draw({ variables: { input: { meetEventId: event.id, heatSize: Number(values.heatSize), seed } } });
      onDrawn(`${eventTitle(event)} drawn with seed ${data?.drawOrder.drawSeed ?? seed}.`);
      onClose();
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: ['heatSize', 'seed'] }));
    }
  });

  return (
    <FormDialog
      title={`Draw the order: ${eventTitle(event)}`}
      onClose={onClose}
      onSubmit={submit}
      submitLabel="Draw"
      submitting={formState.isSubmitting}
    >
      <FormAlert message={alert} />
      <Typography variant="body2">
        Endgrain shuffles the {event.entries.length} {event.entries.length === 1 ? 'entry' : 'entries'} from a seed
        number and stores it, so anyone can check the draw by repeating it with the same seed.
        {event.drawSeed !== null && ' Drawing again without the stored seed replaces the current order.'}
      </Typography>
      <FormTextField
        label="Athletes per heat"
        registration={register('heatSize')}
        fieldError={formState.errors.heatSize}
        slotProps={{ htmlInput: { inputMode: 'numeric' } }}
      />
      <FormTextField
        label="Seed (optional)"
        registration={register('seed')}
        fieldError={formState.errors.seed}
        helperText="Leave blank for a fresh draw."
        slotProps={{ htmlInput: { inputMode: 'numeric', autoComplete: 'off' } }}
      />
      {event.drawSeed !== null && (
        <Button onClick={() => setValue('seed', String(event.drawSeed))} sx={{ alignSelf: 'flex-start' }}>
          Use the stored seed ({event.drawSeed})
        </Button>
      )}
    </FormDialog>
  );
}
