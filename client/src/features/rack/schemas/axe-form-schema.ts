import { z } from 'zod';

import type { AxeDetail, AxeInput, UnitPreference } from '../api/types.js';
import { AXE_STATUSES, AXE_USES, GRINDS } from '../lib/rack-labels.js';
import { lengthForForm, lengthToMm, massForForm, massToGrams, readNumber } from '../lib/setup-units.js';

const number = (label: string) =>
  z.string().refine((text) => !Number.isNaN(readNumber(text) ?? 0), `${label} must be a number, such as 19.05 or 3/4.`);

// Bounds and wording follow the server's (server/src/rack/rack.validation.ts); it checks again in SI units.
export const axeFormSchema = z
  .object({
    units: z.enum(['METRIC', 'IMPERIAL']),
    label: z.string().trim().min(1, 'Label is required.').max(40, 'Label must be at most 40 characters.'),
    maker: z.string().trim().max(80, 'Maker must be at most 80 characters.'),
    grind: z.enum(GRINDS),
    bevelIncluded: number('Bevel').refine((text) => {
      const deg = readNumber(text);
      return deg === null || (deg >= 5 && deg <= 60);
    }, 'Bevel (included angle, across both faces) must be between 5° and 60°; a per-side angle is half of it.'),
    chiselWidth: number('Chisel width'),
    headWeight: number('Head weight'),
    bitWidth: number('Bit width'),
    handleLength: number('Handle length'),
    handleWood: z.string().trim().max(40, 'Handle wood must be at most 40 characters.'),
    hangChecked: z.boolean(),
    pinned: z.boolean(),
    status: z.enum(AXE_STATUSES),
    allowedFor: z.enum(AXE_USES),
    isPublic: z.boolean(),
    notes: z.string().max(2000, 'Notes must be at most 2000 characters.'),
  })
  .refine((values) => !(readNumber(values.chiselWidth) !== null && (values.grind === 'FLAT' || values.grind === 'CONVEX')), {
    path: ['chiselWidth'],
    message: 'A flat or convex grind has no chisel: pick the chisel or compound grind, or clear the chisel width.',
  });

export type AxeFormValues = z.infer<typeof axeFormSchema>;

/** The server's field names, and the form box each one belongs to. */
export const AXE_SERVER_FIELDS = {
  label: 'label',
  maker: 'maker',
  grind: 'grind',
  bevelIncludedDeg: 'bevelIncluded',
  chiselWidthMm: 'chiselWidth',
  headWeightG: 'headWeight',
  bitWidthMm: 'bitWidth',
  handleLengthMm: 'handleLength',
  handleWood: 'handleWood',
  notes: 'notes',
} as const satisfies Record<string, keyof AxeFormValues>;

export function axeFormDefaults(units: UnitPreference, axe?: AxeDetail): AxeFormValues {
  return {
    units,
    label: axe?.label ?? '',
    maker: axe?.maker ?? '',
    grind: axe?.grind ?? 'FLAT',
    bevelIncluded: axe?.geometry.includedAngleDeg == null ? '' : String(axe.geometry.includedAngleDeg),
    chiselWidth: lengthForForm(axe?.geometry.chiselWidthMm ?? null, units),
    headWeight: massForForm(axe?.headWeightG ?? null, units),
    bitWidth: lengthForForm(axe?.bitWidthMm ?? null, units),
    handleLength: lengthForForm(axe?.handleLengthMm ?? null, units),
    handleWood: axe?.handleWood ?? '',
    hangChecked: axe?.hangChecked ?? false,
    pinned: axe?.pinned ?? false,
    status: axe?.status ?? 'READY',
    allowedFor: axe?.allowedFor ?? 'ANYONE',
    isPublic: axe?.isPublic ?? false,
    notes: axe?.notes ?? '',
  };
}

/** The form's values in SI units, as the server stores them. */
export function toAxeInput(values: AxeFormValues): AxeInput {
  const { units } = values;
  return {
    label: values.label.trim(),
    maker: values.maker.trim(),
    grind: values.grind,
    bevelIncludedDeg: readNumber(values.bevelIncluded),
    chiselWidthMm: lengthToMm(readNumber(values.chiselWidth), units),
    headWeightG: massToGrams(readNumber(values.headWeight), units),
    bitWidthMm: lengthToMm(readNumber(values.bitWidth), units),
    handleLengthMm: lengthToMm(readNumber(values.handleLength), units),
    handleWood: values.handleWood.trim(),
    hangChecked: values.hangChecked,
    pinned: values.pinned,
    status: values.status,
    allowedFor: values.allowedFor,
    isPublic: values.isPublic,
    notes: values.notes.trim(),
  };
}
