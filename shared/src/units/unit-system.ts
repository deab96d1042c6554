/** A user's display preference; values are always stored in SI (mm, g). */
export type UnitSystem = 'metric' | 'imperial';

export const unitSystems: readonly UnitSystem[] = ['metric', 'imperial'];
