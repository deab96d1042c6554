import type { Path, UseFormSetError } from 'react-hook-form';

import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import type { NoteFormValues } from '../schemas/note-form-schema.js';

// The server names tag fields "tags.species"; the form keeps each tag group as its own field.
const RENAMED: Record<string, Path<NoteFormValues>> = { 'tags.species': 'species', 'tags.grinds': 'grinds', 'tags.events': 'events', 'tags.conditions': 'conditions', 'tags.free': 'free' };
const FIELDS = new Set<string>(['kind', 'title', 'summary', 'bodyMarkdown', 'evidence', 'note', 'species', 'grinds', 'events', 'conditions', 'free']);

/** Puts each server error beside its field (evidence rows included); answers the rest for the alert. */
export function applyNoteErrors(error: unknown, setError: UseFormSetError<NoteFormValues>): string | undefined {
  const rest: string[] = [];
  for (const detail of graphQLErrorDetails(error)) {
    const named = detail.field?.replace(/^input\./, '');
    const field = named ? (RENAMED[named] ?? named) : undefined;
    if (field && (FIELDS.has(field) || /^evidence\.\d+\.(label|summary|refId|species|grind|condition)$/.test(field))) {
      setError(field as Path<NoteFormValues>, { type: 'server', message: detail.message }, { shouldFocus: rest.length === 0 });
    } else {
      rest.push(detail.message);
    }
  }
  return rest.length ? rest.join(' ') : undefined;
}
