import { bandFor, type HeadBand } from './bevel-band.js';

const MM_PER_INCH = 25.4; // exact by definition (1959)

const HALF = 0.5 * MM_PER_INCH;
const THREE_QUARTER = 0.75 * MM_PER_INCH;

/**
 * Chisel (secondary bevel) width bands for the Grain Map, on whole-fraction inch marks
 * because that is how chisels are spoken of (they run from about ¼ in to over 1 in);
 * bounds are held in millimetres.
 */
export const CHISEL_BANDS: readonly HeadBand[] = [
  { id: 'chisel-under-half-inch', label: '<12.7 mm (½ in)', min: null, max: HALF },
  { id: 'chisel-half-to-three-quarter-inch', label: '12.7–19.05 mm (½–¾ in)', min: HALF, max: THREE_QUARTER },
  { id: 'chisel-three-quarter-to-one-inch', label: '19.05–25.4 mm (¾–1 in)', min: THREE_QUARTER, max: MM_PER_INCH },
  { id: 'chisel-over-one-inch', label: '>25.4 mm (1 in)', min: MM_PER_INCH, max: null },
];

/** The band a chisel width in millimetres falls in (lower bound inclusive). */
export function chiselBand(widthMm: number): HeadBand {
  return bandFor(CHISEL_BANDS, widthMm, 'chisel width');
}
