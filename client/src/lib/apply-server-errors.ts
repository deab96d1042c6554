import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';

import { graphQLErrorDetails } from './graphql-error-details.js';

export interface ApplyServerErrorsOptions<T extends FieldValues> {
  setError: UseFormSetError<T>;
  /** The form's fields a server error may name in `extensions.field`. */
  fields: ReadonlyArray<Path<T>>;
  /** Codes that always belong to one field, e.g. EMAIL_TAKEN → email. */
  fieldForCode?: Readonly<Record<string, Path<T>>>;
}

/**
 * Puts each server error next to the field it concerns and returns the rest as one message for an
 * alert (undefined when every error found its field).
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  { setError, fields, fieldForCode = {} }: ApplyServerErrorsOptions<T>,
): string | undefined {
  const leftOver: string[] = [];
  let firstField = true;
  for (const detail of graphQLErrorDetails(error)) {
    // Input-object fields may come back as "input.email".
    const named = detail.field?.replace(/^input\./, '');
    const field = fieldForCode[detail.code] ?? fields.find((candidate) => candidate === named);
    if (field) {
      setError(field, { type: 'server', message: detail.message }, { shouldFocus: firstField });
      firstField = false;
    } else {
      leftOver.push(detail.message);
    }
  }
  return leftOver.length > 0 ? leftOver.join(' ') : undefined;
}
