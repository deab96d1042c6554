import { useMutation } from '@apollo/client/react';
import { DIVISION_LABELS, DIVISIONS, EXPERIENCE_LABELS, EXPERIENCE_LEVELS } from '@endgrain/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import type { Athlete } from '../api/types.js';
import { ATHLETE_FORM_FIELDS, athleteFormDefaults, athleteFormSchema, toAthleteInput, type AthleteFormValues } from '../schemas/athlete-form-schema.js';
import { RemoveAthleteStep } from './remove-athlete-step.js';
import { ToggleField } from '../../../components/ui/toggle-field.js';

export interface AthleteFormDialogProps {
  clubId: string;
  /** The athlete to edit; leave out to add one. */
  athlete?: Athlete;
  onClose: () => void;
  onDone: (message: string) => void;
}

/** Adds or edits a roster entry; editing also offers removal, behind a second, explicit step. */
export function AthleteFormDialog({ clubId, athlete, onClose, onDone }: AthleteFormDialogProps) {
  const theme = useTheme();
  const fullScreen = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const titleId = useId();
  const [alert, setAlert] = useState<string>();
  const [removing, setRemoving] = useState(false);
  const refetch = { refetchQueries: [{ query: clubsDocuments.club, variables: { id: clubId } }], awaitRefetchQueries: true };
  const [add] = useMutation(clubsDocuments.addAthlete, refetch);
  const [update] = useMutation(clubsDocuments.updateAthlete, refetch);
  const { register, control, handleSubmit, setError, formState } = useForm<AthleteFormValues>({
    resolver: zodResolver(athleteFormSchema),
    defaultValues: athleteFormDefaults(athlete),
  });

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    const input = toAthleteInput(clubId, values);
    try {
      if (athlete) await update({ variables: { id: athlete.id, input } });
      else await add({ variables: { input } });
      onDone(`${input.firstName} ${input.lastName} ${athlete ? 'saved' : 'added to the roster'}.`);
      onClose();
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: ATHLETE_FORM_FIELDS }));
    }
  });

  if (athlete && removing) {
    return (
      <Dialog open onClose={onClose} aria-labelledby={titleId} fullWidth maxWidth="xs">
        <RemoveAthleteStep titleId={titleId} athlete={athlete} onBack={() => setRemoving(false)} onRemoved={(message) => { onDone(message); onClose(); }} />
      </Dialog>
    );
  }

  return (
    <Dialog open onClose={onClose} aria-labelledby={titleId} fullWidth maxWidth="sm" fullScreen={fullScreen}>
      <DialogTitle id={titleId}>{athlete ? `Edit ${athlete.name}` : 'Add an athlete'}</DialogTitle>
      <DialogContent>
        <Stack component="form" id={`${titleId}-form`} noValidate onSubmit={submit} spacing={2.5} sx={{ pt: 1 }}>
          <FormAlert message={alert} />
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
            <FormTextField label="First name" autoComplete="off" registration={register('firstName')} fieldError={formState.errors.firstName} />
            <FormTextField label="Last name" autoComplete="off" registration={register('lastName')} fieldError={formState.errors.lastName} />
          </Stack>
          <ToggleField control={control} name="divisions" label="Divisions" multiple options={DIVISIONS.map((value) => ({ value, label: DIVISION_LABELS[value] }))} />
          <ToggleField control={control} name="experience" label="Experience" options={EXPERIENCE_LEVELS.map((value) => ({ value, label: EXPERIENCE_LABELS[value] }))} />
          <FormTextField
            label="First season (optional)"
            placeholder="2025"
            registration={register('firstSeasonYear')}
            fieldError={formState.errors.firstSeasonYear}
            slotProps={{ htmlInput: { inputMode: 'numeric', maxLength: 4 } }}
          />
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, gap: 1, flexWrap: 'wrap' }}>
        {athlete && (
          <Button color="error" onClick={() => setRemoving(true)} sx={{ mr: 'auto' }}>
            Remove from roster
          </Button>
        )}
        <Button onClick={onClose} disabled={formState.isSubmitting}>
          Cancel
        </Button>
        <Button type="submit" form={`${titleId}-form`} variant="contained" loading={formState.isSubmitting}>
          {athlete ? 'Save' : 'Add athlete'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
