import { CONDITION_TAGS, GRIND_TAGS, taggableSpecies } from '@endgrain/shared';
import AddIcon from '@mui/icons-material/Add';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { Controller, useFieldArray, useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';

import { emptyEvidence, type NoteFormValues } from '../schemas/note-form-schema.js';

const SPECIES = taggableSpecies();
const KINDS = [['GRAIN_CELL', 'Grain Map cell'], ['TRIAL', 'Trial'], ['RESULT', 'Result']] as const;

interface Props {
  control: Control<NoteFormValues>;
  register: UseFormRegister<NoteFormValues>;
  errors: FieldErrors<NoteFormValues>;
}

function SelectField({ control, name, label, options, allowNone }: { control: Control<NoteFormValues>; name: `evidence.${number}.${'kind' | 'species' | 'grind' | 'condition'}`; label: string; options: readonly (readonly [string, string])[]; allowNone?: boolean }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField select size="small" label={label} {...field} error={Boolean(fieldState.error)} helperText={fieldState.error?.message} sx={{ minWidth: 160 }}>
          {allowNone && <MenuItem value="">Any</MenuItem>}
          {options.map(([id, text]) => (
            <MenuItem key={id} value={id}>
              {text}
            </MenuItem>
          ))}
        </TextField>
      )}
    />
  );
}

/** The evidence a finding rests on: Grain Map cells by species, grind and condition, or trials and results by id. */
export function EvidenceEditor({ control, register, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'evidence' });
  const current = useWatch({ control, name: 'evidence' });
  return (
    <Stack spacing={1.5} component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
      <Typography component="legend" variant="subtitle1" sx={{ fontWeight: 700 }}>
        Evidence
      </Typography>
      <Typography variant="body2" color="text.secondary">
        A finding goes to review only with at least one piece of evidence. Each shows beside the text and links to where it lives.
      </Typography>
      {errors.evidence?.message && <Typography color="error">{errors.evidence.message}</Typography>}
      {fields.map((field, i) => {
        const kind = current?.[i]?.kind ?? field.kind;
        const problem = errors.evidence?.[i];
        return (
          <Paper key={field.id} variant="outlined" sx={{ p: 2 }}>
            <Stack spacing={1.5}>
              <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1.5 }}>
                <SelectField control={control} name={`evidence.${i}.kind`} label="Kind" options={KINDS} />
                {kind === 'GRAIN_CELL' ? (
                  <>
                    <SelectField control={control} name={`evidence.${i}.species`} label="Species" options={SPECIES.map((s) => [s.id, s.label] as const)} />
                    <SelectField control={control} name={`evidence.${i}.grind`} label="Grind" options={GRIND_TAGS.map((g) => [g.id, g.label] as const)} allowNone />
                    <SelectField control={control} name={`evidence.${i}.condition`} label="Condition" options={CONDITION_TAGS.map((c) => [c.id, c.label] as const)} allowNone />
                  </>
                ) : (
                  <TextField size="small" label={kind === 'TRIAL' ? 'Trial id' : 'Result id'} {...register(`evidence.${i}.refId`)} error={Boolean(problem?.refId)} helperText={problem?.refId?.message} sx={{ minWidth: 300 }} />
                )}
              </Stack>
              <TextField size="small" label="Label" {...register(`evidence.${i}.label`)} error={Boolean(problem?.label)} helperText={problem?.label?.message} />
              <TextField size="small" label="The numbers, in a sentence" {...register(`evidence.${i}.summary`)} error={Boolean(problem?.summary)} helperText={problem?.summary?.message ?? 'For example: 14 results, 6 athletes, median 31.20 s.'} />
              <Button color="error" onClick={() => remove(i)} sx={{ alignSelf: 'flex-start' }} aria-label={`Remove evidence ${i + 1}`}>
                Remove
              </Button>
            </Stack>
          </Paper>
        );
      })}
      <Button startIcon={<AddIcon />} onClick={() => append(emptyEvidence())} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
        Add evidence
      </Button>
    </Stack>
  );
}
