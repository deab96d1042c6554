import type { Division } from '../league/divisions.js';
import type { BlockCondition } from './block-conditions.js';
import type { HeadGrind } from './head-grinds.js';
import type { PostedStatus } from './posted-statuses.js';

/** One validated row of a results sheet, before it is matched to the meet's entries. */
export interface SheetRow {
  row: number;
  event: string;
  division: Division;
  club: string;
  athletes: string[];
  /** Raw watch times in hundredths, zero to three of them, in the order given. */
  rawTimes: number[];
  score: number | null;
  penaltySeconds: number;
  status: PostedStatus;
  reason: string | null;
  axeLabel: string | null;
  grind: HeadGrind | null;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
  speciesId: string | null;
  diameterMm: number | null;
  condition: BlockCondition | null;
}
