/** The two fixed tables hosts use most; anything else is typed as a custom list. */
export const POINTS_TABLE_PRESETS = {
  '7-6-5-4-3-2-1': [7, 6, 5, 4, 3, 2, 1],
  '5-4-3-2-1-0': [5, 4, 3, 2, 1, 0],
} as const satisfies Record<string, readonly number[]>;

export type PointsTablePreset = keyof typeof POINTS_TABLE_PRESETS;

export type ParsedPointsTable = { ok: true; points: number[] } | { ok: false; message: string };

/**
 * A custom table typed as "10, 8, 6" or "10-8-6" (first place first), checked by the server's
 * rules: at least one place, at most 50, no negative points, never more than the place above.
 */
export function parsePointsTable(text: string): ParsedPointsTable {
  // A dash also separates places ("7-6-5"), so a minus sign is only one at the start or after a comma.
  if (/(^|[,;])\s*[-–]\s*\d/.test(text.trim())) return { ok: false, message: 'Points must be zero or more.' };
  const parts = text.split(/[\s,;\-–]+/).filter(Boolean);
  if (parts.length === 0) return { ok: false, message: 'Type the place points, first place first, for example 10, 8, 6, 4, 2.' };
  if (parts.length > 50) return { ok: false, message: 'A points table has at most 50 places.' };
  const points: number[] = [];
  for (const [index, part] of parts.entries()) {
    const value = Number(part);
    if (!/^\d+(\.\d+)?$/.test(part) || !Number.isFinite(value)) {
      return { ok: false, message: `Place ${index + 1}: "${part}" is not a number of points (zero or more).` };
    }
    if (index > 0 && value > points[index - 1]!) {
      return { ok: false, message: `Place ${index + 1} cannot earn more points than place ${index}.` };
    }
    points.push(value);
  }
  return { ok: true, points };
}

/** The preset a stored table matches, or undefined for a custom one. */
export function presetOf(points: readonly number[] | null | undefined): PointsTablePreset | undefined {
  if (!points) return undefined;
  return (Object.keys(POINTS_TABLE_PRESETS) as PointsTablePreset[]).find(
    (key) => POINTS_TABLE_PRESETS[key].join('-') === points.join('-'),
  );
}
