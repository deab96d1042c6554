import { CONDITION_TAGS, eventName, GRIND_TAGS, speciesName, type ArticleKind, type ArticleStatus } from '@endgrain/shared';

import type { NoteTags } from '../api/types.js';

export const KIND_LABELS: Record<ArticleKind, string> = { FINDING: 'Finding', GUIDE: 'Guide', SAFETY_NOTE: 'Safety note' };
export const KIND_PLURALS: Record<ArticleKind, string> = { FINDING: 'Findings', GUIDE: 'Guides', SAFETY_NOTE: 'Safety notes' };

export const STATUS_LABELS: Record<ArticleStatus, string> = { DRAFT: 'Draft', IN_REVIEW: 'In review', PUBLISHED: 'Published' };

export const conditionLabel = (id: string) => CONDITION_TAGS.find((c) => c.id === id)?.label ?? id;
export const grindLabel = (id: string) => GRIND_TAGS.find((g) => g.id === id)?.label ?? id;
export const speciesLabel = (id: string) => speciesName(id) ?? id;
export const eventLabel = (code: string) => eventName(code) ?? code;

export interface TagChip {
  key: string;
  label: string;
  /** Which tag group, for a screen reader ("species: quaking aspen"). */
  group: string;
}

/** A note's tags as labelled chips, in a fixed order: species, condition, grind, event, free. */
export function tagChips(tags: NoteTags): TagChip[] {
  return [
    ...tags.species.map((id) => ({ key: `s-${id}`, label: speciesLabel(id), group: 'species' })),
    ...tags.conditions.map((id) => ({ key: `c-${id}`, label: conditionLabel(id), group: 'block condition' })),
    ...tags.grinds.map((id) => ({ key: `g-${id}`, label: grindLabel(id), group: 'grind' })),
    ...tags.events.map((code) => ({ key: `e-${code}`, label: eventLabel(code), group: 'event' })),
    ...tags.free.map((tag) => ({ key: `f-${tag}`, label: tag, group: 'tag' })),
  ];
}

/** "12 Oct 2026" in the reader's language. */
export function formatNoteDate(iso: string | null): string {
  if (!iso) return '';
  return new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

/** Draft views come back with the working copy's text under the same id as the published view:
 * they are kept out of the normalised cache so one never shows in place of the other. */
export const WORKING_COPY = { fetchPolicy: 'no-cache' } as const;
