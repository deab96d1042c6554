import type { AxeServiceKind, AxeStatus, AxeUse, Grind } from '../api/types.js';

// Trade words where the trade has them (flat, convex, chisel, hone, rehang); our own words elsewhere.
export const GRINDS: readonly Grind[] = ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'];
export const GRIND_LABELS: Record<Grind, string> = {
  FLAT: 'Flat',
  CONVEX: 'Convex',
  CHISEL: 'Chisel',
  COMPOUND: 'Compound',
};
export const GRIND_HINTS: Record<Grind, string> = {
  FLAT: 'Straight faces from the cheek to the edge.',
  CONVEX: 'Faces curved out from the cheek to the edge (a "banana" grind).',
  CHISEL: 'A secondary bevel at the edge.',
  COMPOUND: 'A flat or convex body with a chisel at the edge.',
};

export const AXE_STATUSES: readonly AxeStatus[] = ['READY', 'NEEDS_EDGE', 'NEEDS_HANDLE', 'HEAD_LOOSE', 'RETIRED'];
export const STATUS_LABELS: Record<AxeStatus, string> = {
  READY: 'Ready',
  NEEDS_EDGE: 'Needs an edge',
  NEEDS_HANDLE: 'Needs a handle',
  HEAD_LOOSE: 'Head loose',
  RETIRED: 'Retired',
};
/** Statuses that keep an axe out of anyone's hands (the server refuses them in a lineup). */
export const OUT_OF_USE: ReadonlySet<AxeStatus> = new Set(['NEEDS_HANDLE', 'HEAD_LOOSE', 'RETIRED']);

export const AXE_USES: readonly AxeUse[] = ['ANYONE', 'DEVELOPING_UP', 'EXPERIENCED_ONLY'];
export const USE_LABELS: Record<AxeUse, string> = {
  ANYONE: 'Anyone',
  DEVELOPING_UP: 'Developing and experienced',
  EXPERIENCED_ONLY: 'Experienced only',
};

/** Kinds a coach logs; SETUP_CORRECTED is written by the server when the record is edited. */
export type LoggedServiceKind = Exclude<AxeServiceKind, 'SETUP_CORRECTED'>;
export const SERVICE_KINDS: readonly LoggedServiceKind[] = ['REGRIND', 'HONE', 'REHANG', 'TIGHTEN_OR_PIN', 'INSPECT', 'RETIRE'];
export const SERVICE_LABELS: Record<AxeServiceKind, string> = {
  REGRIND: 'Regrind',
  HONE: 'Hone',
  REHANG: 'Rehang',
  TIGHTEN_OR_PIN: 'Tighten or pin',
  INSPECT: 'Inspect',
  RETIRE: 'Retire',
  SETUP_CORRECTED: 'Record corrected',
};
