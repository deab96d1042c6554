import type { AxeService, AxeStatus, AxeUse, Grind, UnitPreference } from '../api/types.js';
import { GRIND_LABELS, STATUS_LABELS, USE_LABELS } from './rack-labels.js';
import { showLength, showMass } from './setup-units.js';

type Change = AxeService['changes'][number];

const FIELD_NAMES: Record<string, string> = {
  grind: 'Grind',
  bevelIncludedDeg: 'Bevel',
  chiselWidthMm: 'Chisel width',
  headWeightG: 'Head weight',
  bitWidthMm: 'Bit width',
  handleLengthMm: 'Handle length',
  handleWood: 'Handle wood',
  hangChecked: 'Hang checked',
  pinned: 'Pinned',
  status: 'Status',
  allowedFor: 'Who may use it',
};

function show(field: string, value: string | null, units: UnitPreference): string {
  if (value === null || value === '') return 'not recorded';
  const n = Number(value);
  switch (field) {
    case 'bevelIncludedDeg':
      return `${n}° included (${n / 2}° per side)`;
    case 'chiselWidthMm':
    case 'bitWidthMm':
    case 'handleLengthMm':
      return showLength(n, units);
    case 'headWeightG':
      return showMass(n, units);
    case 'grind':
      return GRIND_LABELS[value as Grind] ?? value;
    case 'status':
      return STATUS_LABELS[value as AxeStatus] ?? value;
    case 'allowedFor':
      return USE_LABELS[value as AxeUse] ?? value;
    case 'hangChecked':
    case 'pinned':
      return value === 'true' ? 'yes' : 'no';
    default:
      return value;
  }
}

/** One logged setup change in plain words and the reader's units: "Bevel: 16° included (8° per side) → 15° …". */
export function describeChange(change: Change, units: UnitPreference): string {
  return `${FIELD_NAMES[change.field] ?? change.field}: ${show(change.field, change.before, units)} → ${show(change.field, change.after, units)}`;
}
