import { formatQuantity } from './format-quantity.js';
import { mmToInches } from './mm-to-inches.js';
import type { UnitSystem } from './unit-system.js';

export interface FormatLengthOptions {
  /** Most decimals shown; trailing zeros are dropped. Default 1 for mm, 2 for inches. */
  digits?: number;
}

/** A stored length in millimetres, printed in the user's units with the unit always shown. */
export function formatLength(mm: number, system: UnitSystem, options: FormatLengthOptions = {}): string {
  if (system === 'metric') return formatQuantity(mm, options.digits ?? 1, 'mm');
  return formatQuantity(mmToInches(mm), options.digits ?? 2, 'in');
}
