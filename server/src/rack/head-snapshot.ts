import { perSideFromIncluded } from '@endgrain/shared';

import type { AxeEntity } from './entities/axe.entity.js';
import type { GrindValue } from './entities/rack-values.js';

/** The head setup a result keeps, frozen at the moment it is recorded (later regrinds do not touch it). */
export interface HeadSnapshot {
  axeId: string;
  label: string;
  maker: string;
  grind: GrindValue;
  bevelIncludedDeg: number | null;
  bevelPerSideDeg: number | null;
  chiselWidthMm: number | null;
  headWeightG: number | null;
  bitWidthMm: number | null;
  takenAt: string;
}

export function headSnapshot(axe: AxeEntity, now = new Date()): HeadSnapshot {
  return {
    axeId: axe.id,
    label: axe.label,
    maker: axe.maker,
    grind: axe.grind,
    bevelIncludedDeg: axe.bevelIncludedDeg,
    bevelPerSideDeg: axe.bevelIncludedDeg === null ? null : perSideFromIncluded(axe.bevelIncludedDeg),
    chiselWidthMm: axe.chiselWidthMm,
    headWeightG: axe.headWeightG,
    bitWidthMm: axe.bitWidthMm,
    takenAt: now.toISOString(),
  };
}
