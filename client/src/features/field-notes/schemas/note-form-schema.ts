import { ARTICLE_KINDS, EVIDENCE_KINDS } from '@endgrain/shared';
import { z } from 'zod';

import type { FieldNote, FieldNoteInput } from '../api/types.js';

// The server checks the same bounds (server/src/field-notes/article-values.ts); these give the message sooner.
export const MAX_BODY = 30_000;

const evidenceSchema = z
  .object({
    kind: z.enum(EVIDENCE_KINDS),
    refId: z.string().trim(),
    species: z.string(),
    grind: z.string(),
    condition: z.string(),
    label: z.string().trim().min(2, 'Give the evidence a short label.').max(120, 'At most 120 characters.'),
    summary: z.string().trim().max(400, 'At most 400 characters.'),
  })
  .superRefine((link, ctx) => {
    if (link.kind === 'GRAIN_CELL' && !link.species) ctx.addIssue({ code: 'custom', path: ['species'], message: 'Pick the species of the Grain Map row.' });
    if (link.kind !== 'GRAIN_CELL' && !/^[0-9a-f-]{36}$/i.test(link.refId)) ctx.addIssue({ code: 'custom', path: ['refId'], message: 'Paste the id from the trial or result page.' });
  });

export const noteFormSchema = z.object({
  kind: z.enum(ARTICLE_KINDS),
  title: z.string().trim().min(5, 'A title needs at least 5 characters.').max(140, 'At most 140 characters.'),
  summary: z.string().trim().min(10, 'Say in a sentence what the note is about (at least 10 characters).').max(300, 'At most 300 characters.'),
  bodyMarkdown: z.string().trim().min(1, 'Write the note itself.').max(MAX_BODY, `At most ${MAX_BODY.toLocaleString('en')} characters; split it into two notes.`),
  species: z.array(z.string()),
  conditions: z.array(z.string()),
  grinds: z.array(z.string()),
  events: z.array(z.string()),
  free: z.array(z.string()),
  evidence: z.array(evidenceSchema).max(20, 'Link at most 20 pieces of evidence.'),
  note: z.string().trim().max(200, 'At most 200 characters.'),
});

export type NoteFormValues = z.infer<typeof noteFormSchema>;
export type EvidenceFormValues = NoteFormValues['evidence'][number];

export function emptyEvidence(): EvidenceFormValues {
  return { kind: 'GRAIN_CELL', refId: '', species: '', grind: '', condition: '', label: '', summary: '' };
}

export function noteFormDefaults(note?: FieldNote): NoteFormValues {
  return {
    kind: note?.kind ?? 'FINDING',
    title: note?.title ?? '',
    summary: note?.summary ?? '',
    bodyMarkdown: note?.bodyMarkdown ?? '',
    species: note?.tags.species ?? [],
    conditions: note?.tags.conditions ?? [],
    grinds: note?.tags.grinds ?? [],
    events: note?.tags.events ?? [],
    free: note?.tags.free ?? [],
    evidence: (note?.evidence ?? []).map((e) => ({ kind: e.kind, refId: e.refId ?? '', species: e.species ?? '', grind: e.grind ?? '', condition: e.condition ?? '', label: e.label, summary: e.summary })),
    note: '',
  };
}

export function toFieldNoteInput(values: NoteFormValues): FieldNoteInput {
  return {
    kind: values.kind,
    title: values.title,
    summary: values.summary,
    bodyMarkdown: values.bodyMarkdown,
    tags: { species: values.species, conditions: values.conditions, grinds: values.grinds, events: values.events, free: values.free },
    evidence: values.evidence.map((e) =>
      e.kind === 'GRAIN_CELL'
        ? { kind: e.kind, refId: null, species: e.species, grind: e.grind || null, condition: e.condition || null, label: e.label, summary: e.summary }
        : { kind: e.kind, refId: e.refId, label: e.label, summary: e.summary },
    ),
    note: values.note,
  };
}
