import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm, type FieldPath, type UseFormSetError } from 'react-hook-form';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { AxeDetail, UnitPreference } from '../api/types.js';
import { AXE_STATUSES, GRIND_LABELS, GRINDS, SERVICE_KINDS, SERVICE_LABELS, STATUS_LABELS } from '../lib/rack-labels.js';
import { unitWords } from '../lib/setup-units.js';
import { SERVICE_SERVER_FIELDS, SETUP_BOXES, serviceFormDefaults, serviceFormSchema, toServiceInput, type ServiceFormValues } from '../schemas/service-form-schema.js';
import { RackCautions } from './rack-cautions.js';
import { FormDialog } from '../../../components/ui/form-dialog.js';
import { SelectField } from '../../../components/ui/select-field.js';

export interface ServiceFormDialogProps {
  axe: AxeDetail;
  units: UnitPreference;
  today: string;
  onClose: () => void;
  onSaved: (message: string) => void;
}

const UNCHANGED = { value: '', label: 'Unchanged' };
const YES_NO = [UNCHANGED, { value: 'yes', label: 'Yes' }, { value: 'no', label: 'No' }];
const decimal = (unit: string) => ({ input: { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> }, htmlInput: { inputMode: 'decimal' as const } });

/** Logs work on an axe; what the work changed becomes the axe's setup, and the old values stay in the log. */
export function ServiceFormDialog({ axe, units, today, onClose, onSaved }: ServiceFormDialogProps) {
  const [alert, setAlert] = useState<string>();
  const [log] = useMutation(rackDocuments.logAxeService, { refetchQueries: [rackDocuments.rack], awaitRefetchQueries: true });
  const { register, control, handleSubmit, setError, formState, watch } = useForm<ServiceFormValues>({
    resolver: zodResolver(serviceFormSchema),
    defaultValues: serviceFormDefaults(today, axe.status === 'NEEDS_HANDLE' || axe.status === 'HEAD_LOOSE' ? 'REHANG' : 'REGRIND'),
  });
  const kind = watch('kind');
  const boxes = new Set(SETUP_BOXES[kind]);
  const words = unitWords(units);
  const setServerError: UseFormSetError<Record<string, unknown>> = (name, error, options) =>
    setError(SERVICE_SERVER_FIELDS[name as keyof typeof SERVICE_SERVER_FIELDS] as FieldPath<ServiceFormValues>, error, options);

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    try {
      await log({ variables: { input: toServiceInput(axe.id, values, units) } });
      onSaved(`${SERVICE_LABELS[values.kind]} logged for ${axe.label}.`);
      onClose();
    } catch (error) {
      setAlert(applyServerErrors(error, { setError: setServerError, fields: Object.keys(SERVICE_SERVER_FIELDS) }));
    }
  });
  const field = (name: keyof ServiceFormValues) => ({ registration: register(name), fieldError: formState.errors[name] });

  return (
    <FormDialog fullScreenOnPhone title={`Log a service: ${axe.label}`} onClose={onClose} onSubmit={submit} submitLabel="Log service" submitting={formState.isSubmitting}>
      <RackCautions screen="service" />
      <FormAlert message={alert} />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
        <SelectField control={control} name="kind" label="Work done" options={SERVICE_KINDS.map((k) => ({ value: k, label: SERVICE_LABELS[k] }))} />
        <FormTextField label="Date" type="date" {...field('doneOn')} slotProps={{ inputLabel: { shrink: true } }} />
      </Stack>
      <FormTextField label="Done by (optional)" autoComplete="off" {...field('doneBy')} helperText="Leave empty for yourself" />
      {kind === 'RETIRE' ? (
        <Typography>Retiring takes {axe.label} out of use for good; it stays in the rack's history.</Typography>
      ) : (
        <Typography variant="h3" component="h3">
          Setup after the work <Typography component="span" sx={{ color: 'text.secondary' }}>(leave a box empty if it did not change)</Typography>
        </Typography>
      )}
      {boxes.has('grind') && <SelectField control={control} name="grind" label="Grind" options={[UNCHANGED, ...GRINDS.map((g) => ({ value: g, label: GRIND_LABELS[g] }))]} />}
      {boxes.has('bevelIncluded') && (
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
          <FormTextField label="New bevel, included angle" {...field('bevelIncluded')} helperText="Across both faces; per side is half of it" slotProps={decimal('°')} />
          <FormTextField label="New chisel width" {...field('chiselWidth')} slotProps={decimal(words.length)} />
        </Stack>
      )}
      {boxes.has('handleLength') && (
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
          <FormTextField label="New handle length" {...field('handleLength')} slotProps={decimal(words.length)} />
          <FormTextField label="Handle wood" {...field('handleWood')} />
        </Stack>
      )}
      {boxes.has('hangChecked') && <SelectField control={control} name="hangChecked" label="Hang checked" options={YES_NO} />}
      {boxes.has('pinned') && <SelectField control={control} name="pinned" label="Pinned" options={YES_NO} />}
      {boxes.has('status') && <SelectField control={control} name="status" label="Status after the work" options={[UNCHANGED, ...AXE_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))]} />}
      <FormTextField label="Notes (optional)" multiline minRows={2} {...field('notes')} />
    </FormDialog>
  );
}
