import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { useEffect, useState } from 'react';
import { useForm, type FieldPath, type UseFormSetError } from 'react-hook-form';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { AxeDetail, UnitPreference } from '../api/types.js';
import { AXE_STATUSES, AXE_USES, GRIND_HINTS, GRIND_LABELS, GRINDS, STATUS_LABELS, USE_LABELS } from '../lib/rack-labels.js';
import { lengthForForm, lengthToMm, massForForm, massToGrams, readNumber, unitWords } from '../lib/setup-units.js';
import { AXE_SERVER_FIELDS, axeFormDefaults, axeFormSchema, toAxeInput, type AxeFormValues } from '../schemas/axe-form-schema.js';
import { RackCheck } from './rack-check.js';
import { FormDialog } from '../../../components/ui/form-dialog.js';
import { SelectField } from '../../../components/ui/select-field.js';

export interface AxeFormDialogProps {
  clubId: string;
  units: UnitPreference;
  /** The axe to edit; leave out to add one. */
  axe?: AxeDetail;
  onClose: () => void;
  onSaved: (axe: AxeDetail) => void;
}

const LENGTHS = ['chiselWidth', 'bitWidth', 'handleLength'] as const;
const unit = (text: string) => ({ input: { endAdornment: <InputAdornment position="end">{text}</InputAdornment> }, htmlInput: { inputMode: 'decimal' as const, autoComplete: 'off' } });

/** Adds or edits an axe; values are typed in mm and kg or in and lb and sent in SI units. */
export function AxeFormDialog({ clubId, units: preferred, axe, onClose, onSaved }: AxeFormDialogProps) {
  const [alert, setAlert] = useState<string>();
  const refetch = { refetchQueries: [rackDocuments.rack], awaitRefetchQueries: true };
  const [add] = useMutation(rackDocuments.addAxe, refetch);
  const [update] = useMutation(rackDocuments.updateAxe, refetch);
  const { register, control, handleSubmit, setError, formState, watch, getValues, setValue } = useForm<AxeFormValues>({
    resolver: zodResolver(axeFormSchema),
    defaultValues: axeFormDefaults(preferred, axe),
  });
  const units = watch('units');
  const words = unitWords(units);
  const grind = watch('grind');
  const included = readNumber(watch('bevelIncluded'));
  const noChisel = grind === 'FLAT' || grind === 'CONVEX';
  // A flat or convex grind has no chisel: its box empties and locks rather than showing an error.
  useEffect(() => {
    if (noChisel) setValue('chiselWidth', '');
  }, [noChisel, setValue]);

  // Switching units converts what is already typed, so 19.05 mm becomes 0.75 in rather than 19.05 in.
  const switchUnits = (next: UnitPreference) => {
    const from = getValues('units');
    if (next === from) return;
    for (const field of LENGTHS) setValue(field, lengthForForm(lengthToMm(readNumber(getValues(field)), from), next));
    setValue('headWeight', massForForm(massToGrams(readNumber(getValues('headWeight')), from), next));
    setValue('units', next);
  };

  // The server names its own fields (chiselWidthMm); each goes beside the matching box.
  const setServerError: UseFormSetError<Record<string, unknown>> = (name, error, options) =>
    setError(AXE_SERVER_FIELDS[name as keyof typeof AXE_SERVER_FIELDS] as FieldPath<AxeFormValues>, error, options);

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    const input = toAxeInput(values);
    try {
      const result = axe ? (await update({ variables: { id: axe.id, input } })).data?.updateAxe : (await add({ variables: { clubId, input } })).data?.addAxe;
      if (result) onSaved(result);
    } catch (error) {
      setAlert(applyServerErrors(error, { setError: setServerError, fields: Object.keys(AXE_SERVER_FIELDS) }));
    }
  });

  const field = (name: keyof AxeFormValues) => ({ registration: register(name), fieldError: formState.errors[name] });
  return (
    <FormDialog fullScreenOnPhone title={axe ? `Edit ${axe.label}` : 'Add an axe'} onClose={onClose} onSubmit={submit} submitLabel={axe ? 'Save' : 'Add axe'} submitting={formState.isSubmitting}>
      <FormAlert message={alert} />
      <ToggleButtonGroup exclusive size="small" color="primary" aria-label="Units for this form" value={units} onChange={(_event, next: UnitPreference | null) => next && switchUnits(next)}>
        <ToggleButton value="METRIC">mm and kg</ToggleButton>
        <ToggleButton value="IMPERIAL">in and lb</ToggleButton>
      </ToggleButtonGroup>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
        <FormTextField label="Label" autoComplete="off" {...field('label')} helperText="What the club calls it, e.g. Race 3" />
        <FormTextField label="Maker (optional)" autoComplete="off" {...field('maker')} />
      </Stack>
      <SelectField control={control} name="grind" label="Grind" options={GRINDS.map((g) => ({ value: g, label: GRIND_LABELS[g] }))} helperText={GRIND_HINTS[grind]} />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
        <FormTextField
          label="Bevel, included angle (optional)"
          {...field('bevelIncluded')}
          helperText={included !== null && !Number.isNaN(included) ? `Across both faces; ${included / 2}° per side` : 'Across both faces; per side is half of it'}
          slotProps={unit('°')}
        />
        <FormTextField
          label="Chisel width (optional)"
          {...field('chiselWidth')}
          disabled={noChisel}
          helperText="Straight back from the edge; fractions such as 3/4 work"
          slotProps={unit(words.length)}
        />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
        <FormTextField label="Head weight (optional)" {...field('headWeight')} slotProps={unit(words.mass)} />
        <FormTextField label="Bit width (optional)" {...field('bitWidth')} slotProps={unit(words.length)} />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
        <FormTextField label="Handle length (optional)" {...field('handleLength')} slotProps={unit(words.length)} />
        <FormTextField label="Handle wood (optional)" autoComplete="off" {...field('handleWood')} />
      </Stack>
      <Stack direction="row" spacing={2} sx={{ flexWrap: 'wrap' }}>
        <RackCheck control={control} name="hangChecked" label="Hang checked" />
        <RackCheck control={control} name="pinned" label="Pinned" />
        <RackCheck control={control} name="isPublic" label="Show outside the club" />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
        <SelectField control={control} name="status" label="Status" options={AXE_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))} />
        <SelectField control={control} name="allowedFor" label="Who may use it" options={AXE_USES.map((u) => ({ value: u, label: USE_LABELS[u] }))} />
      </Stack>
      <FormTextField label="Notes (optional)" multiline minRows={2} {...field('notes')} />
    </FormDialog>
  );
}
