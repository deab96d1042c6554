import { formatQuantity } from './format-quantity.js';
import { gramsToPounds } from './grams-to-pounds.js';
import type { UnitSystem } from './unit-system.js';

export interface FormatMassOptions {
  /** Most decimals shown; trailing zeros are dropped. Default 2. */
  digits?: number;
}

/** A stored mass in grams, printed as kg or lb (head weights are quoted in both) with the unit. */
export function formatMass(grams: number, system: UnitSystem, options: FormatMassOptions = {}): string {
  const digits = options.digits ?? 2;
  if (system === 'metric') return formatQuantity(grams / 1000, digits, 'kg');
  return formatQuantity(gramsToPounds(grams), digits, 'lb');
}
