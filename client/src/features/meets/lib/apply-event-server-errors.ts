import type { UseFormSetError } from 'react-hook-form';

import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { EVENT_SERVER_FIELDS, type EventFormValues } from '../schemas/event-form-schema.js';

type ServerFields = Record<keyof typeof EVENT_SERVER_FIELDS, unknown>;

/**
 * The server names millimetre and hundredth fields (diameterMm, timeLimitHundredths); the form
 * holds what was typed. Errors are put beside the typed field; the rest come back for an alert.
 */
export function applyEventServerErrors(error: unknown, setError: UseFormSetError<EventFormValues>): string | undefined {
  return applyServerErrors<ServerFields>(error, {
    setError: (name, fieldError, options) =>
      setError(EVENT_SERVER_FIELDS[name as keyof typeof EVENT_SERVER_FIELDS], fieldError, options),
    fields: Object.keys(EVENT_SERVER_FIELDS) as (keyof ServerFields)[],
  });
}
