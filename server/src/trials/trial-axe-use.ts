import type { AxeStatusValue } from '../rack/entities/rack-values.js';

// A loose head, a cracked handle or a retired axe stays out of use until it is fixed (safety).
const OUT_OF_USE: Record<AxeStatusValue, string | null> = {
  READY: null,
  NEEDS_EDGE: null,
  NEEDS_HANDLE: 'its handle needs replacing',
  HEAD_LOOSE: 'its head is loose',
  RETIRED: 'it is retired',
};

export function isUsable(status: AxeStatusValue): boolean {
  return OUT_OF_USE[status] === null;
}

/** Why an axe may not be swung, in words, or null when it may. */
export function outOfUseReason(status: AxeStatusValue): string | null {
  return OUT_OF_USE[status];
}
