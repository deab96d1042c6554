import { ApiError } from './api-error.js';
import type { Doc } from './document-path.js';

const STRING_ID = /^[A-Za-z0-9_-]+$/;

/** A document id is a non-negative integer or a short string of letters, digits, `-` and `_`. */
export function validDocumentId(value: unknown): boolean {
  if (typeof value === 'number') return Number.isSafeInteger(value) && value >= 0;
  return typeof value === 'string' && STRING_ID.test(value) && Buffer.byteLength(value) <= 511;
}

/** With no primary key given, the one attribute whose name ends in "id" (any case) becomes it. */
export function inferPrimaryKey(first: Doc | undefined): string {
  const candidates = first === undefined ? [] : Object.keys(first).filter((name) => /id$/i.test(name));
  if (candidates.length === 1) return candidates[0] as string;
  if (candidates.length === 0) {
    throw new ApiError('index_primary_key_no_candidate_found', 'No primary key was given and no attribute ending in `id` was found to infer one.');
  }
  throw new ApiError(
    'index_primary_key_multiple_candidates_found',
    `No primary key was given and several attributes could be it: ${candidates.map((name) => `\`${name}\``).join(', ')}.`,
  );
}
