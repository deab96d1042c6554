import { parseQuantity } from './parse-quantity.js';
import { poundsToGrams } from './pounds-to-grams.js';

export type ParsedMass = { ok: true; grams: number } | { ok: false; message: string };

const massGrammar = {
  units: {
    g: (value: number) => value,
    kg: (value: number) => value * 1000,
    lb: poundsToGrams,
    lbs: poundsToGrams,
  },
  noun: 'mass',
  unitList: 'g, kg or lb',
  example: '"3.5 lb" or "1.6 kg"',
};

/** A mass with its unit, e.g. "3.5 lb", "1.6 kg", "1590 g", to grams. A bare number is refused. */
export function parseMass(text: string): ParsedMass {
  const parsed = parseQuantity(text, massGrammar);
  return parsed.ok ? { ok: true, grams: parsed.value } : parsed;
}
