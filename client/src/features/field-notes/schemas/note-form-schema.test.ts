import { describe, expect, it } from '@jest/globals';

import { emptyEvidence, noteFormDefaults, noteFormSchema, toFieldNoteInput, type NoteFormValues } from './note-form-schema.js';

const filled: NoteFormValues = {
  ...noteFormDefaults(),
  title: 'Chisels in green aspen',
  summary: 'What our autumn trials said about chisels.',
  bodyMarkdown: '## Seen\n\nDeeper cuts.',
  species: ['quaking-aspen'],
  evidence: [{ ...emptyEvidence(), species: 'quaking-aspen', grind: 'CHISEL', label: 'Grain Map cell' }],
};

const issues = (values: NoteFormValues) => {
  const result = noteFormSchema.safeParse(values);
  return result.success ? {} : Object.fromEntries(result.error.issues.map((i) => [i.path.join('.'), i.message]));
};

describe('noteFormSchema', () => {
  it('accepts a complete finding and sends a Grain Map cell without a ref id', () => {
    expect(issues(filled)).toEqual({});
    expect(toFieldNoteInput(filled).evidence).toEqual([
      { kind: 'GRAIN_CELL', refId: null, species: 'quaking-aspen', grind: 'CHISEL', condition: null, label: 'Grain Map cell', summary: '' },
    ]);
  });

  it('asks for a species on a Grain Map cell and an id on a trial', () => {
    const values = { ...filled, evidence: [{ ...emptyEvidence(), label: 'cell' }, { ...emptyEvidence(), kind: 'TRIAL' as const, label: 'trial' }] };
    expect(issues(values)).toEqual({ 'evidence.0.species': 'Pick the species of the Grain Map row.', 'evidence.1.refId': 'Paste the id from the trial or result page.' });
  });

  it('names a title that is too short', () => {
    expect(issues({ ...filled, title: 'Axe' })).toEqual({ title: 'A title needs at least 5 characters.' });
  });
});
