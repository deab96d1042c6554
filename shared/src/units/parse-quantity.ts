export type ParsedQuantity = { ok: true; value: number } | { ok: false; message: string };

export interface QuantityGrammar {
  /** Lower-case unit spellings to a converter into the stored SI unit. */
  units: Readonly<Record<string, (value: number) => number>>;
  /** How the message names the thing and its units, e.g. 'length' and 'mm, cm, in or "'. */
  noun: string;
  unitList: string;
  example: string;
}

// A whole and a fraction ("12 1/2"), a fraction ("1/4") or a decimal ("12", "12.5", ".5"),
// then an optional unit, with or without a space before it.
const MIXED = String.raw`(?<whole>\d+)\s+(?<mixedTop>\d+)/(?<mixedBottom>\d+)`;
const FRACTION = String.raw`(?<top>\d+)/(?<bottom>\d+)`;
const DECIMAL = String.raw`(?<decimal>\d+(?:\.\d+)?|\.\d+)`;
const UNIT = String.raw`(?<unit>[^\d\s./][^\d]*?)`;
const QUANTITY = new RegExp(`^(?:${MIXED}|${FRACTION}|${DECIMAL})\\s*${UNIT}?$`, 'u');

/** Parses "number unit" text (as found in CSV imports) into the stored SI unit. */
export function parseQuantity(text: string, grammar: QuantityGrammar): ParsedQuantity {
  const trimmed = text.trim();
  const groups = QUANTITY.exec(trimmed)?.groups;
  if (!groups) {
    return { ok: false, message: `"${text}" is not a ${grammar.noun} like ${grammar.example}` };
  }
  const amount = readAmount(groups);
  if (amount === null) return { ok: false, message: `"${text}" has a fraction with a zero denominator` };
  const unit = groups['unit']?.trim().toLowerCase();
  if (!unit) return { ok: false, message: `"${text}" needs a unit (${grammar.unitList})` };
  const convert = grammar.units[unit];
  if (!convert) {
    return { ok: false, message: `"${text}" has an unknown unit "${unit}" (use ${grammar.unitList})` };
  }
  return { ok: true, value: convert(amount) };
}

function readAmount(groups: Record<string, string | undefined>): number | null {
  if (groups['decimal'] !== undefined) return Number(groups['decimal']);
  const top = Number(groups['top'] ?? groups['mixedTop']);
  const bottom = Number(groups['bottom'] ?? groups['mixedBottom']);
  if (bottom === 0) return null;
  return Number(groups['whole'] ?? 0) + top / bottom;
}
