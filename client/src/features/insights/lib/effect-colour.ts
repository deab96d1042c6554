import { contrastRatio } from '../../../lib/contrast-ratio.js';

/**
 * A blue-to-orange scale for the within-athlete effect: blue is faster than usual, orange
 * slower, pale near no difference. Blue and orange stay apart for the common red–green colour
 * blindnesses, and every cell also prints its number and label, so colour is never the only cue.
 */
const FASTER = [22, 70, 132];
const SLOWER = [150, 62, 8];
const NEUTRAL = [244, 241, 234];

/** Colour for an effect ratio (0.95 = 5 % faster); ±8 % is the full colour. */
export function effectColour(ratio: number | null): string {
  if (ratio === null) return 'transparent';
  const strength = Math.min(Math.abs(1 - ratio) / 0.08, 1);
  const end = ratio < 1 ? FASTER : SLOWER;
  const mix = NEUTRAL.map((n, i) => Math.round(n + (end[i]! - n) * strength));
  return `rgb(${mix.join(', ')})`;
}

// Pure black and white: at any background one of them reaches at least 4.58:1.
const DARK_TEXT = '#000000';
const LIGHT_TEXT = '#ffffff';

/** Whichever of dark or white text stands out more on the cell's colour. */
export function effectTextColour(ratio: number | null): string {
  if (ratio === null) return DARK_TEXT;
  const hex = effectHex(ratio);
  return contrastRatio(DARK_TEXT, hex) >= contrastRatio(LIGHT_TEXT, hex) ? DARK_TEXT : LIGHT_TEXT;
}

export function effectHex(ratio: number): string {
  const rgb = effectColour(ratio).match(/\d+/g)!.map(Number);
  return `#${rgb.map((c) => c.toString(16).padStart(2, '0')).join('')}`;
}

/** "4 % faster", "2 % slower", "within 1 %". */
export function effectWords(ratio: number): string {
  const percent = Math.round(Math.abs(1 - ratio) * 100);
  if (percent === 0) return 'within 1 %';
  return `${percent} % ${ratio < 1 ? 'faster' : 'slower'}`;
}
