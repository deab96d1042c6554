/** Column value types of the rack tables (the GraphQL enums mirror them). */
export type GrindValue = 'FLAT' | 'CONVEX' | 'CHISEL' | 'COMPOUND';
export type AxeStatusValue = 'READY' | 'NEEDS_EDGE' | 'NEEDS_HANDLE' | 'HEAD_LOOSE' | 'RETIRED';
export type AxeUseValue = 'ANYONE' | 'DEVELOPING_UP' | 'EXPERIENCED_ONLY';
export type AxeServiceKindValue = 'REGRIND' | 'HONE' | 'REHANG' | 'TIGHTEN_OR_PIN' | 'INSPECT' | 'RETIRE' | 'SETUP_CORRECTED';

export const GRINDS: readonly GrindValue[] = ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'];
export const AXE_STATUSES: readonly AxeStatusValue[] = ['READY', 'NEEDS_EDGE', 'NEEDS_HANDLE', 'HEAD_LOOSE', 'RETIRED'];
export const AXE_USES: readonly AxeUseValue[] = ['ANYONE', 'DEVELOPING_UP', 'EXPERIENCED_ONLY'];

/** DECIMAL columns come back from mysql2 as strings. */
export const decimal = {
  to: (v: number | null | undefined) => v,
  from: (v: string | null) => (v === null ? null : Number(v)),
};
