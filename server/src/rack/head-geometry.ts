import { perSideFromIncluded, shoulderThickness } from '@endgrain/shared';

import type { HeadGeometryModel } from './models/axe.model.js';

const round = (value: number, digits: number): number => Math.round(value * 10 ** digits) / 10 ** digits;

/** Included and per-side angles and the shoulder thickness, from what is known of the bevel. */
export function headGeometry(includedDeg: number | null, chiselWidthMm: number | null): HeadGeometryModel {
  const perSide = includedDeg === null ? null : perSideFromIncluded(includedDeg);
  const shoulder =
    includedDeg === null || chiselWidthMm === null ? null : shoulderThickness({ includedDeg, chiselWidthMm, measuredAlong: 'back-from-edge' });
  return {
    includedAngleDeg: includedDeg,
    perSideAngleDeg: perSide === null ? null : round(perSide, 3),
    chiselWidthMm,
    shoulderThicknessMm: shoulder === null ? null : round(shoulder, 3),
  };
}
