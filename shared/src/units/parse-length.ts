import { inchesToMm } from './inches-to-mm.js';
import { parseQuantity } from './parse-quantity.js';

export type ParsedLength = { ok: true; mm: number } | { ok: false; message: string };

const identity = (value: number): number => value;

const lengthGrammar = {
  units: {
    mm: identity,
    cm: (value: number) => value * 10,
    in: inchesToMm,
    inch: inchesToMm,
    inches: inchesToMm,
    '"': inchesToMm,
    '\u2033': inchesToMm, // double prime, as typed by some keyboards for inches
  },
  noun: 'length',
  unitList: 'mm, cm, in or "',
  example: '"12 in" or "305 mm"',
};

/**
 * A length with its unit, e.g. "12 in", "12in", "12\"", "12 1/2 in", "305 mm", "30.5 cm",
 * to millimetres. A bare number is refused: an import must not guess the unit.
 */
export function parseLength(text: string): ParsedLength {
  const parsed = parseQuantity(text, lengthGrammar);
  return parsed.ok ? { ok: true, mm: parsed.value } : parsed;
}
