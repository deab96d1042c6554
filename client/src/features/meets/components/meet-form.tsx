import { DIVISION_LABELS, DIVISIONS } from '@endgrain/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { Link as RouterLink } from 'react-router';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { SubmitButton } from '../../../components/ui/submit-button.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import type { ClubOption, Season } from '../api/types.js';
import { MEET_FORM_FIELDS, meetFormSchema, type MeetFormValues } from '../schemas/meet-form-schema.js';
import { CheckboxGroupField } from '../../../components/ui/checkbox-group-field.js';
import { MeetScoringFields } from './meet-scoring-fields.js';
import { SelectField } from '../../../components/ui/select-field.js';

export interface MeetFormProps {
  defaults: MeetFormValues;
  seasons: Season[];
  clubs: ClubOption[];
  /** The meet has results: a scoring change needs a reason on record. */
  askReason: boolean;
  submitLabel: string;
  cancelHref: string;
  /** Saves; a rejection's server errors are put beside their fields, the rest in the form's alert. */
  onSave: (values: MeetFormValues) => Promise<unknown>;
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper component="fieldset" variant="outlined" sx={{ p: { xs: 2, sm: 3 }, m: 0, minWidth: 0 }}>
      <Typography component="legend" variant="h3" sx={{ px: 0.5 }}>
        {title}
      </Typography>
      <Stack spacing={2.5} sx={{ mt: 1 }}>
        {children}
      </Stack>
    </Paper>
  );
}

export function MeetForm({ defaults, seasons, clubs, askReason, submitLabel, cancelHref, onSave }: MeetFormProps) {
  const [alert, setAlert] = useState<string>();
  const { register, control, handleSubmit, setError, formState } = useForm<MeetFormValues>({
    resolver: zodResolver(meetFormSchema),
    defaultValues: defaults,
  });
  const { errors } = formState;
  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    try {
      await onSave(values);
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: MEET_FORM_FIELDS }));
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={3} sx={{ maxWidth: 760 }}>
      <FormAlert message={alert} />
      <Section title="The meet">
        <FormTextField label="Meet name" registration={register('name')} fieldError={errors.name} autoComplete="off" />
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
          <SelectField control={control} name="seasonId" label="Season" options={seasons.map((season) => ({ value: season.id, label: season.name }))} />
          <SelectField control={control} name="hostClubId" label="Host club" options={clubs.map((club) => ({ value: club.id, label: club.name }))} />
        </Stack>
        <FormTextField label="Venue" registration={register('venue')} fieldError={errors.venue} />
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
          <FormTextField
            label="Meet date"
            type="date"
            registration={register('startsOn')}
            fieldError={errors.startsOn}
            slotProps={{ inputLabel: { shrink: true } }}
          />
          <FormTextField
            label="Entries close"
            type="datetime-local"
            registration={register('entryDeadline')}
            fieldError={errors.entryDeadline}
            helperText="In your own time zone; on or before the meet day."
            slotProps={{ inputLabel: { shrink: true } }}
          />
        </Stack>
        <CheckboxGroupField
          control={control}
          name="divisions"
          label="Divisions"
          options={DIVISIONS.map((division) => ({ value: division, label: DIVISION_LABELS[division] }))}
        />
      </Section>
      <Section title="Scoring">
        <MeetScoringFields control={control} register={register} errors={errors} />
      </Section>
      {askReason && (
        <Section title="Why the change">
          <FormTextField
            label="Reason for changing the scoring"
            multiline
            minRows={2}
            registration={register('reason')}
            fieldError={errors.reason}
            helperText="This meet has results. A scoring change is recomputed and recorded with this reason."
          />
        </Section>
      )}
      <Stack direction={{ xs: 'column-reverse', sm: 'row' }} spacing={1.5} sx={{ alignItems: { sm: 'center' } }}>
        <Button component={RouterLink} to={cancelHref} size="large">
          Cancel
        </Button>
        <Stack sx={{ flex: 1, maxWidth: { sm: 320 } }}>
          <SubmitButton pending={formState.isSubmitting}>{submitLabel}</SubmitButton>
        </Stack>
      </Stack>
    </Stack>
  );
}
