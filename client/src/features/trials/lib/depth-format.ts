import { formatLength } from '@endgrain/shared';

import type { UnitPreference } from '../api/types.js';

/** A depth in the reader's units, unit printed: "35.2 mm" or "1.39 in". */
export function formatDepth(mm: number, units: UnitPreference): string {
  return units === 'IMPERIAL' ? formatLength(mm, 'imperial', { digits: 2 }) : formatLength(mm, 'metric', { digits: 1 });
}

/** A block diameter: blocks are cut to the inch or the millimetre. */
export function formatDiameter(mm: number, units: UnitPreference): string {
  return units === 'IMPERIAL' ? formatLength(mm, 'imperial', { digits: 1 }) : formatLength(mm, 'metric', { digits: 0 });
}

/** Depths for a chart axis in the reader's unit (numbers only). */
export function depthValue(mm: number, units: UnitPreference): number {
  return units === 'IMPERIAL' ? Number((mm / 25.4).toFixed(3)) : mm;
}

/**
 * The server writes its recommendation with depths in millimetres ("35.2 mm a swing"); an
 * imperial reader gets inches in the same place.
 */
export function localiseRecommendation(sentence: string, units: UnitPreference): string {
  if (units !== 'IMPERIAL') return sentence;
  return sentence.replace(/(\d+(?:\.\d+)?) mm a swing/g, (_match, mm: string) => `${formatDepth(Number(mm), 'IMPERIAL')} a swing`);
}
