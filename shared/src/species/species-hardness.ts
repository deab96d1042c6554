import { speciesById } from './species-by-id.js';

export type HardnessCondition = 'green' | 'dry12';
export type HardnessUnit = 'lbf' | 'N';

export type HardnessReading =
  | { kind: 'published'; value: number; unit: HardnessUnit; condition: HardnessCondition; source: string }
  | { kind: 'no-published-value'; unit: HardnessUnit; condition: HardnessCondition; message: string };

/**
 * Side hardness exactly as the table prints it. A blank cell stays blank: the newton value
 * is not converted from a printed lbf value (the table rounds each unit on its own), and no
 * value is borrowed from a related species.
 */
export function speciesHardness(id: string, condition: HardnessCondition, unit: HardnessUnit): HardnessReading {
  const record = speciesById(id);
  if (record === undefined) throw new RangeError(`unknown species id "${id}"`);
  const value = (unit === 'lbf' ? record.hardnessLbf : record.hardnessN)[condition];
  if (value === null) {
    const state = condition === 'green' ? 'green' : 'at 12 % moisture';
    return {
      kind: 'no-published-value',
      unit,
      condition,
      message: `No published value: the table gives no side hardness in ${unit} for ${record.commonName} ${state}.`,
    };
  }
  return { kind: 'published', value, unit, condition, source: record.source };
}
