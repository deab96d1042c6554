import { checkArticleTags, conditionById, grindById, renderMarkdown, speciesById, type ArticleTags, type EvidenceLink } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';
import { text } from '../league/league.validation.js';
import type { EvidenceLinkInput, FieldNoteInput } from './dto/field-note.inputs.js';

/** Long enough for a full guide with tables; a JSON request stays inside the body-size limit. */
export const MAX_BODY_CHARACTERS = 30_000;
export const MAX_EVIDENCE_LINKS = 20;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export interface RevisionValues {
  title: string;
  summary: string;
  bodyMarkdown: string;
  bodyHtml: string;
  tags: ArticleTags;
  evidence: EvidenceLink[];
  note: string;
}

function body(raw: string): string {
  const value = (raw ?? '').replace(/\r\n?/g, '\n').trim();
  if (value.length === 0) throw DomainError.badInput('bodyMarkdown', 'Write the note itself.');
  if (value.length > MAX_BODY_CHARACTERS) {
    throw DomainError.badInput('bodyMarkdown', `A note is at most ${MAX_BODY_CHARACTERS.toLocaleString('en')} characters; split it into two.`);
  }
  return value;
}

function evidenceLink(input: EvidenceLinkInput, i: number): EvidenceLink {
  const field = `evidence.${i}`;
  const label = text(`${field}.label`, 'Evidence label', input.label, 2, 120);
  const summary = text(`${field}.summary`, 'Evidence summary', input.summary, 0, 400);
  if (input.kind === 'GRAIN_CELL') {
    const species = input.species ?? '';
    if (!speciesById(species)) throw DomainError.badInput(`${field}.species`, 'A Grain Map cell needs a species from the species table.');
    if (input.grind && !grindById(input.grind)) throw DomainError.badInput(`${field}.grind`, `"${input.grind}" is not a grind.`);
    if (input.condition && !conditionById(input.condition)) throw DomainError.badInput(`${field}.condition`, `"${input.condition}" is not a block condition.`);
    return { kind: 'GRAIN_CELL', refId: null, species, grind: input.grind || null, condition: input.condition || null, label, summary };
  }
  if (!UUID.test(input.refId ?? '')) throw DomainError.badInput(`${field}.refId`, `Give the ${input.kind === 'TRIAL' ? 'trial' : 'result'} this evidence points at.`);
  return { kind: input.kind, refId: (input.refId as string).toLowerCase(), species: null, grind: null, condition: null, label, summary };
}

/** Checks a note's input and renders its markdown; every problem names its field. */
export function revisionValues(input: FieldNoteInput): RevisionValues {
  const { tags, problems } = checkArticleTags(input.tags);
  const problem = problems[0];
  if (problem) throw DomainError.badInput(problem.field, problem.message);
  if (input.evidence.length > MAX_EVIDENCE_LINKS) throw DomainError.badInput('evidence', `Link at most ${MAX_EVIDENCE_LINKS} pieces of evidence.`);
  const bodyMarkdown = body(input.bodyMarkdown);
  return {
    title: text('title', 'Title', input.title, 5, 140),
    summary: text('summary', 'Summary', input.summary, 10, 300),
    bodyMarkdown,
    bodyHtml: renderMarkdown(bodyMarkdown),
    tags,
    evidence: input.evidence.map(evidenceLink),
    note: text('note', 'Change note', input.note, 0, 200),
  };
}
