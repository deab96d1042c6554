import { formatLength } from '@endgrain/shared';

import type { UnitPreference } from '../api/types.js';

/** A block diameter in the reader's units, unit printed: "305 mm" or "12 in" (blocks are cut to the inch). */
export function formatDiameter(mm: number, units: UnitPreference): string {
  return units === 'IMPERIAL' ? formatLength(mm, 'imperial', { digits: 1 }) : formatLength(mm, 'metric', { digits: 0 });
}
