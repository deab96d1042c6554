export interface HeadBand {
  id: string;
  label: string;
  /** Inclusive lower bound; null for the open bottom band. */
  min: number | null;
  /** Exclusive upper bound; null for the open top band. */
  max: number | null;
}

/**
 * Included-angle bands for the Grain Map. Racing bevels run from about 13° to 17–18°,
 * so the two-degree bands sit across that range with an open band either side.
 */
export const BEVEL_BANDS: readonly HeadBand[] = [
  { id: 'bevel-under-14', label: '<14°', min: null, max: 14 },
  { id: 'bevel-14-16', label: '14–16°', min: 14, max: 16 },
  { id: 'bevel-16-18', label: '16–18°', min: 16, max: 18 },
  { id: 'bevel-over-18', label: '>18°', min: 18, max: null },
];

/** The band an included angle falls in (lower bound inclusive: exactly 16° is "16–18°"). */
export function bevelBand(includedDeg: number): HeadBand {
  return bandFor(BEVEL_BANDS, includedDeg, 'included angle');
}

export function bandFor(bands: readonly HeadBand[], value: number, what: string): HeadBand {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${what} must be a non-negative number, got ${value}`);
  const band = bands.find((b) => (b.min === null || value >= b.min) && (b.max === null || value < b.max));
  if (band === undefined) throw new RangeError(`no band holds ${what} ${value}`);
  return band;
}
