import { BLOCK_CONDITION_LABELS, formatLength, formatTime, HEAD_GRIND_LABELS } from '@endgrain/shared';

import type { Result, UnitPreference } from '../api/types.js';

const SHORT_STATUS = { FINISHED: '', SCRATCH: 'Scratch', DID_NOT_FINISH: 'DNF', DISQUALIFIED: 'DQ' } as const;

/** "3", "1=" for a shared place, or the status when unplaced: "DQ", "DNF", "Scratch". */
export function placeLabel(result: Pick<Result, 'place' | 'tied' | 'status'>): string {
  if (result.place === null) return SHORT_STATUS[result.status] || '–';
  return `${result.place}${result.tied ? '=' : ''}`;
}

/** What ranked the result: the time with penalties for timed events, the score or hits otherwise. */
export function markLabel(result: Pick<Result, 'resultKind' | 'totalHundredths' | 'score'>): string {
  if (result.resultKind === 'TIMED') return result.totalHundredths === null ? '–' : formatTime(result.totalHundredths);
  if (result.score === null) return '–';
  const time = result.totalHundredths === null ? '' : ` (${formatTime(result.totalHundredths)})`;
  return result.resultKind === 'FEWEST_HITS' ? `${result.score} ${result.score === 1 ? 'hit' : 'hits'}${time}` : `${result.score}${time}`;
}

export function penaltyLabel(hundredths: number): string {
  return hundredths === 0 ? '' : `+${(hundredths / 100).toFixed(hundredths % 100 === 0 ? 0 : 2)} s`;
}

export function pointsLabel(points: number): string {
  return Number.isInteger(points) ? String(points) : points.toFixed(2).replace(/0$/, '');
}

/** "Convex · 32° · chisel 6.4 mm", in the reader's units; empty when nothing was recorded. */
export function headLabel(result: Pick<Result, 'grind' | 'bevelIncludedDeg' | 'chiselWidthMm' | 'axeLabel'>, units: UnitPreference): string {
  const parts = [
    result.axeLabel ? `“${result.axeLabel}”` : null,
    result.grind ? HEAD_GRIND_LABELS[result.grind] : null,
    result.bevelIncludedDeg === null ? null : `${result.bevelIncludedDeg}° included`,
    result.chiselWidthMm === null ? null : `chisel ${formatLength(result.chiselWidthMm, units === 'IMPERIAL' ? 'imperial' : 'metric', { digits: units === 'IMPERIAL' ? 2 : 1 })}`,
  ];
  return parts.filter(Boolean).join(' · ');
}

/** "Eastern white pine, 305 mm, seasoned" in the reader's units. */
export function blockLabel(result: Pick<Result, 'speciesName' | 'diameterMm' | 'condition'>, units: UnitPreference): string {
  const parts = [
    result.speciesName,
    result.diameterMm === null ? null : formatDiameter(result.diameterMm, units),
    result.condition ? BLOCK_CONDITION_LABELS[result.condition].toLowerCase() : null,
  ];
  return parts.filter(Boolean).join(', ');
}

/** Blocks are cut to the inch or to 5 mm: whole millimetres, inches to a tenth. */
export function formatDiameter(mm: number, units: UnitPreference): string {
  return units === 'IMPERIAL' ? formatLength(mm, 'imperial', { digits: 1 }) : formatLength(mm, 'metric', { digits: 0 });
}
