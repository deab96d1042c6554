import { useMutation, useQuery } from '@apollo/client/react';
import { DIVISION_LABELS, listSpecies } from '@endgrain/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { meetsDocuments } from '../api/meets-documents.js';
import type { MeetDetail, MeetEvent, UnitPreference } from '../api/types.js';
import { applyEventServerErrors } from '../lib/apply-event-server-errors.js';
import { formatDiameter } from '../lib/format-diameter.js';
import { eventFormDefaults, eventFormSchema, toMeetEventInput, type EventFormValues } from '../schemas/event-form-schema.js';
import { DiameterField } from './diameter-field.js';
import { FormDialog } from '../../../components/ui/form-dialog.js';
import { SelectField } from '../../../components/ui/select-field.js';
import { sentenceCase } from '../../../lib/sentence-case.js';

export interface EventFormDialogProps {
  meet: MeetDetail;
  /** The event to edit; leave out to add one. */
  event?: MeetEvent;
  units: UnitPreference;
  onClose: () => void;
  onSaved: (message: string) => void;
}

const SPECIES_OPTIONS = [
  { value: '', label: 'Not set' },
  // The table prints names in running-text case ("eastern white pine"); a list entry starts with a capital.
  ...listSpecies().map((species) => ({ value: species.id, label: sentenceCase(species.commonName) })),
];

/** Adds or edits one meet event: event type, division, block, time limit, weight, notes. */
export function EventFormDialog({ meet, event, units, onClose, onSaved }: EventFormDialogProps) {
  const [alert, setAlert] = useState<string>();
  const types = useQuery(meetsDocuments.eventTypes);
  const refetch = { refetchQueries: [{ query: meetsDocuments.meet, variables: { id: meet.id } }], awaitRefetchQueries: true };
  const [add] = useMutation(meetsDocuments.addMeetEvent, refetch);
  const [update] = useMutation(meetsDocuments.updateMeetEvent, refetch);
  const defaults = eventFormDefaults(event, units);
  if (!event && meet.divisions.length === 1) defaults.division = meet.divisions[0]!;
  const { register, control, handleSubmit, setError, watch, formState } = useForm<EventFormValues>({
    resolver: zodResolver(eventFormSchema),
    defaultValues: defaults,
  });

  const type = types.data?.eventTypes.find((candidate) => candidate.id === watch('eventTypeId'));
  const scoring = watch('scoring');
  const usual = type?.defaultDiameters.find((entry) => entry.division === watch('division'));
  const diameterHint = usual
    ? `Leave blank for this event's usual ${formatDiameter(usual.diameterMm, units)}.`
    : type
      ? 'No block size is set for this event by default.'
      : undefined;

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    const input = toMeetEventInput(values);
    try {
      if (event) await update({ variables: { id: event.id, input } });
      else await add({ variables: { meetId: meet.id, input } });
      const name = types.data?.eventTypes.find((candidate) => candidate.id === input.eventTypeId)?.name ?? 'The event';
      onSaved(`${name} (${DIVISION_LABELS[input.division]}) ${event ? 'saved' : 'added'}.`);
      onClose();
    } catch (error) {
      setAlert(applyEventServerErrors(error, setError));
    }
  });

  const { errors } = formState;
  return (
    <FormDialog
      title={event ? 'Edit event' : 'Add an event'}
      onClose={onClose}
      onSubmit={submit}
      submitLabel={event ? 'Save event' : 'Add event'}
      submitting={formState.isSubmitting}
      fullScreenOnPhone
    >
      <FormAlert message={alert} />
      {types.error && <FormAlert message="The event catalogue could not be loaded. Close this and try again." />}
      <SelectField
        control={control}
        name="eventTypeId"
        label="Event"
        helperText={type?.description}
        options={(types.data?.eventTypes ?? []).map((candidate) => ({
          value: candidate.id,
          label: `${candidate.name}${candidate.teamSize === 2 ? ' (pairs)' : candidate.teamSize > 2 ? ` (teams of ${candidate.teamSize})` : ''}`,
        }))}
      />
      <SelectField
        control={control}
        name="division"
        label="Division"
        options={meet.divisions.map((division) => ({ value: division, label: DIVISION_LABELS[division] }))}
      />
      <SelectField control={control} name="speciesId" label="Block species" options={SPECIES_OPTIONS} />
      <DiameterField control={control} register={register} errors={errors} hint={diameterHint} />
      <FormTextField
        label="Time limit (optional)"
        placeholder="m:ss.hh"
        registration={register('timeLimit')}
        fieldError={errors.timeLimit}
        helperText="A run over the limit counts as a disqualification. Write it like 3:00.00 or 90."
        slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
      />
      <FormTextField
        label="Event weight"
        registration={register('weight')}
        fieldError={errors.weight}
        helperText="Points in this event are multiplied by this (1 for most events, 1.5 for a technical one)."
        slotProps={{ htmlInput: { inputMode: 'decimal' } }}
      />
      <SelectField
        control={control}
        name="scoring"
        label="Scoring"
        helperText="Most events score like the rest of the meet; a championship or novelty event may have its own."
        options={[
          { value: 'MEET', label: 'As the rest of the meet' },
          { value: 'FIXED_TABLE', label: 'Its own points table' },
          { value: 'FIELD_SIZE', label: 'Field size' },
          { value: 'PERCENT_OF_BEST', label: 'Percentage of the best' },
        ]}
      />
      {scoring === 'FIXED_TABLE' && (
        <FormTextField
          label="Points table for this event"
          placeholder="10, 8, 6, 4, 2"
          registration={register('pointsTable')}
          fieldError={errors.pointsTable}
          helperText="First place first; lower places earn nothing."
          slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
        />
      )}
      <FormTextField label="Notes (optional)" multiline minRows={2} registration={register('notes')} fieldError={errors.notes} />
    </FormDialog>
  );
}
