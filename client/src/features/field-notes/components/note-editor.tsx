import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import { CONDITION_TAGS, EVENT_CATALOGUE, GRIND_TAGS, taggableSpecies } from '@endgrain/shared';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { fieldNotesDocuments as docs } from '../api/field-notes-documents.js';
import type { FieldNote } from '../api/types.js';
import { applyNoteErrors } from '../lib/apply-note-errors.js';
import { KIND_LABELS, WORKING_COPY } from '../lib/note-labels.js';
import { noteFormDefaults, noteFormSchema, toFieldNoteInput, type NoteFormValues } from '../schemas/note-form-schema.js';
import { EvidenceEditor } from './evidence-editor.js';
import { MarkdownField } from './markdown-field.js';
import { TagPicker } from './tag-picker.js';

const SPECIES = taggableSpecies();
const EVENTS = EVENT_CATALOGUE.map((e) => ({ id: e.code, label: e.name }));

export interface NoteEditorProps {
  /** The working copy being edited; leave out to write a new note. */
  note?: FieldNote;
  onSaved: (note: FieldNote, submitted: boolean) => void;
}

/** Writes a note or a new revision of one; "save and send for review" saves first, then submits. */
export function NoteEditor({ note, onSaved }: NoteEditorProps) {
  const [alert, setAlert] = useState<string>();
  const [create] = useMutation(docs.createFieldNote, WORKING_COPY);
  const [update] = useMutation(docs.updateFieldNote, WORKING_COPY);
  const [submit] = useMutation(docs.submitFieldNote, WORKING_COPY);
  const { register, control, handleSubmit, setError, watch, formState } = useForm<NoteFormValues>({ resolver: zodResolver(noteFormSchema), defaultValues: noteFormDefaults(note) });
  const { errors, isSubmitting } = formState;
  const kind = watch('kind');

  const save = (andSubmit: boolean) =>
    handleSubmit(async (values) => {
      setAlert(undefined);
      try {
        const input = toFieldNoteInput(values);
        const saved = note ? (await update({ variables: { id: note.id, input } })).data!.updateFieldNote : (await create({ variables: { input } })).data!.createFieldNote;
        if (andSubmit && saved.canSubmit) {
          onSaved((await submit({ variables: { id: saved.id } })).data!.submitFieldNote, true);
        } else {
          onSaved(saved, false);
        }
      } catch (error) {
        setAlert(applyNoteErrors(error, setError));
      }
    });

  return (
    <Stack component="form" noValidate spacing={3} onSubmit={(e) => void save(false)(e)} sx={{ maxWidth: 920 }}>
      <FormAlert message={alert} />
      <Controller
        control={control}
        name="kind"
        render={({ field }) => (
          <TextField select label="Kind of note" {...field} disabled={Boolean(note)} helperText={note ? 'A note keeps its kind.' : 'Findings need evidence and a second reader before they are published.'} sx={{ maxWidth: 320 }}>
            {(Object.keys(KIND_LABELS) as (keyof typeof KIND_LABELS)[]).map((k) => (
              <MenuItem key={k} value={k}>
                {KIND_LABELS[k]}
              </MenuItem>
            ))}
          </TextField>
        )}
      />
      <FormTextField label="Title" registration={register('title')} fieldError={errors.title} fullWidth />
      <FormTextField label="Summary" registration={register('summary')} fieldError={errors.summary} helperText="One or two sentences, shown in lists and search." multiline minRows={2} fullWidth />
      <Controller control={control} name="bodyMarkdown" render={({ field, fieldState }) => <MarkdownField value={field.value} onChange={field.onChange} error={fieldState.error?.message} />} />
      <Stack spacing={2}>
        <Typography variant="subtitle1" sx={{ fontWeight: 700 }}>
          Tags
        </Typography>
        <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' } }}>
        {(['species', 'conditions', 'grinds', 'events', 'free'] as const).map((name) => (
          <Controller
            key={name}
            control={control}
            name={name}
            render={({ field, fieldState }) => (
              <TagPicker
                label={{ species: 'Species', conditions: 'Block condition', grinds: 'Grind', events: 'Event', free: 'Other tags' }[name]}
                options={{ species: SPECIES, conditions: CONDITION_TAGS, grinds: GRIND_TAGS, events: EVENTS, free: [] }[name]}
                free={name === 'free'}
                value={field.value}
                onChange={field.onChange}
                error={fieldState.error?.message}
              />
            )}
          />
        ))}
        </Box>
      </Stack>
      {(kind === 'FINDING' || (note?.evidence.length ?? 0) > 0) && <EvidenceEditor control={control} register={register} errors={errors} />}
      {note && <FormTextField label="What changed (for the revision list)" registration={register('note')} fieldError={errors.note} fullWidth />}
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <Button type="submit" variant="outlined" size="large" loading={isSubmitting}>
          Save draft
        </Button>
        <Button variant="contained" size="large" loading={isSubmitting} onClick={(e) => void save(true)(e)}>
          Save and send for review
        </Button>
      </Stack>
    </Stack>
  );
}
