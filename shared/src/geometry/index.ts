export { includedFromPerSide, perSideFromIncluded } from './bevel-angle.js';
export { bevelBand, BEVEL_BANDS } from './bevel-band.js';
export type { HeadBand } from './bevel-band.js';
export { chiselBand, CHISEL_BANDS } from './chisel-band.js';
export { includedAngleFromThickness } from './included-angle-from-thickness.js';
export type { IncludedAngleInput } from './included-angle-from-thickness.js';
export { shoulderThickness } from './shoulder-thickness.js';
export type { ChiselMeasure, ShoulderThicknessInput } from './shoulder-thickness.js';
