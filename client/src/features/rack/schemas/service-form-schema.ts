import { z } from 'zod';

import type { AxeServiceInput, AxeSetupChange, UnitPreference } from '../api/types.js';
import { AXE_STATUSES, GRINDS, SERVICE_KINDS, type LoggedServiceKind } from '../lib/rack-labels.js';
import { lengthToMm, readNumber } from '../lib/setup-units.js';

const optionalNumber = (label: string) => z.string().refine((text) => !Number.isNaN(readNumber(text) ?? 0), `${label} must be a number, such as 16 or 3/4.`);
const yesNo = z.enum(['', 'yes', 'no']);

/** Which setup boxes each kind of work may change (an empty box leaves the value as it is). */
export const SETUP_BOXES: Record<LoggedServiceKind, readonly ('grind' | 'bevelIncluded' | 'chiselWidth' | 'handleLength' | 'handleWood' | 'hangChecked' | 'pinned' | 'status')[]> = {
  REGRIND: ['grind', 'bevelIncluded', 'chiselWidth', 'status'],
  HONE: ['status'],
  REHANG: ['handleLength', 'handleWood', 'hangChecked', 'status'],
  TIGHTEN_OR_PIN: ['pinned', 'status'],
  INSPECT: ['status'],
  RETIRE: [],
};

export const serviceFormSchema = z.object({
  kind: z.enum(SERVICE_KINDS),
  doneOn: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Service date must be a date written YYYY-MM-DD.'),
  doneBy: z.string().trim().max(80, 'Done by must be at most 80 characters.'),
  notes: z.string().max(1000, 'Notes must be at most 1000 characters.'),
  grind: z.union([z.enum(GRINDS), z.literal('')]),
  bevelIncluded: optionalNumber('Bevel'),
  chiselWidth: optionalNumber('Chisel width'),
  handleLength: optionalNumber('Handle length'),
  handleWood: z.string().trim().max(40, 'Handle wood must be at most 40 characters.'),
  hangChecked: yesNo,
  pinned: yesNo,
  status: z.union([z.enum(AXE_STATUSES), z.literal('')]),
});

export type ServiceFormValues = z.infer<typeof serviceFormSchema>;

export const SERVICE_SERVER_FIELDS = {
  doneOn: 'doneOn',
  doneBy: 'doneBy',
  notes: 'notes',
  grind: 'grind',
  bevelIncludedDeg: 'bevelIncluded',
  chiselWidthMm: 'chiselWidth',
  handleLengthMm: 'handleLength',
  handleWood: 'handleWood',
  status: 'status',
} as const satisfies Record<string, keyof ServiceFormValues>;

export function serviceFormDefaults(today: string, kind: ServiceFormValues['kind'] = 'REGRIND'): ServiceFormValues {
  return { kind, doneOn: today, doneBy: '', notes: '', grind: '', bevelIncluded: '', chiselWidth: '', handleLength: '', handleWood: '', hangChecked: '', pinned: '', status: '' };
}

/** Only the boxes this kind of work shows, and only those filled in, become setup changes. */
export function toServiceInput(axeId: string, values: ServiceFormValues, units: UnitPreference): AxeServiceInput {
  const boxes = new Set(SETUP_BOXES[values.kind]);
  const setup: AxeSetupChange = {};
  const bevel = readNumber(values.bevelIncluded);
  const chisel = readNumber(values.chiselWidth);
  const handle = readNumber(values.handleLength);
  if (boxes.has('grind') && values.grind) setup.grind = values.grind;
  if (boxes.has('bevelIncluded') && bevel !== null) setup.bevelIncludedDeg = bevel;
  if (boxes.has('chiselWidth') && chisel !== null) setup.chiselWidthMm = lengthToMm(chisel, units);
  if (boxes.has('handleLength') && handle !== null) setup.handleLengthMm = lengthToMm(handle, units);
  if (boxes.has('handleWood') && values.handleWood.trim()) setup.handleWood = values.handleWood.trim();
  if (boxes.has('hangChecked') && values.hangChecked) setup.hangChecked = values.hangChecked === 'yes';
  if (boxes.has('pinned') && values.pinned) setup.pinned = values.pinned === 'yes';
  if (boxes.has('status') && values.status) setup.status = values.status;
  return {
    axeId,
    kind: values.kind,
    doneOn: values.doneOn,
    doneBy: values.doneBy.trim() || null,
    notes: values.notes.trim(),
    setup: Object.keys(setup).length > 0 ? setup : null,
  };
}
