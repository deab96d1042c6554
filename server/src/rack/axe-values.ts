import { text } from '../league/league.validation.js';
import { DomainError } from '../common/errors/domain-error.js';
import type { AxeInput } from './dto/axe.input.js';
import type { AxeEntity } from './entities/axe.entity.js';
import type { SetupChange } from './entities/axe-service.entity.js';
import {
  BIT_WIDTH_MM,
  CHISEL_WIDTH_MM,
  HANDLE_LENGTH_MM,
  HEAD_WEIGHT_G,
  includedAngle,
  lengthMm,
  massG,
  optionalText,
} from './rack.validation.js';

/** The axe fields that make up its setup; a change to any of them goes into the service log. */
export const SETUP_FIELDS = [
  'grind',
  'bevelIncludedDeg',
  'chiselWidthMm',
  'headWeightG',
  'bitWidthMm',
  'handleLengthMm',
  'handleWood',
  'hangChecked',
  'pinned',
  'status',
  'allowedFor',
] as const;

export type SetupField = (typeof SETUP_FIELDS)[number];
export type AxeSetup = Pick<AxeEntity, SetupField>;
export type AxeValues = AxeSetup & Pick<AxeEntity, 'label' | 'maker' | 'isPublic' | 'notes'>;

/** A flat or convex grind has no secondary bevel, so a chisel width there is a typing slip. */
export function assertChiselFitsGrind(setup: Pick<AxeSetup, 'grind' | 'chiselWidthMm'>): void {
  if (setup.chiselWidthMm !== null && (setup.grind === 'FLAT' || setup.grind === 'CONVEX')) {
    throw DomainError.badInput('chiselWidthMm', 'A flat or convex grind has no chisel: pick the chisel or compound grind, or clear the chisel width.');
  }
}

/** Checked setup values in SI units. */
export function setupValues(raw: { [K in SetupField]?: unknown } & Pick<AxeSetup, 'grind' | 'status' | 'allowedFor'>): AxeSetup {
  const setup: AxeSetup = {
    grind: raw.grind,
    bevelIncludedDeg: includedAngle('bevelIncludedDeg', raw.bevelIncludedDeg as number | null | undefined),
    chiselWidthMm: lengthMm('chiselWidthMm', 'Chisel width', raw.chiselWidthMm as number | null | undefined, CHISEL_WIDTH_MM),
    headWeightG: massG('headWeightG', 'Head weight', raw.headWeightG as number | null | undefined, HEAD_WEIGHT_G),
    bitWidthMm: lengthMm('bitWidthMm', 'Bit width', raw.bitWidthMm as number | null | undefined, BIT_WIDTH_MM),
    handleLengthMm: lengthMm('handleLengthMm', 'Handle length', raw.handleLengthMm as number | null | undefined, HANDLE_LENGTH_MM),
    handleWood: optionalText('handleWood', 'Handle wood', raw.handleWood as string | null | undefined, 40),
    hangChecked: Boolean(raw.hangChecked),
    pinned: Boolean(raw.pinned),
    status: raw.status,
    allowedFor: raw.allowedFor,
  };
  assertChiselFitsGrind(setup);
  return setup;
}

export function axeValues(input: AxeInput): AxeValues {
  return {
    ...setupValues(input),
    label: text('label', 'Label', input.label, 1, 40),
    maker: optionalText('maker', 'Maker', input.maker, 80),
    isPublic: Boolean(input.isPublic),
    notes: optionalText('notes', 'Notes', input.notes, 2000),
  };
}

/** The setup fields whose value differs, as before → after pairs. */
export function setupChanges(before: AxeSetup, after: AxeSetup): SetupChange[] {
  return SETUP_FIELDS.flatMap((field) => {
    const a = before[field] ?? null;
    const b = after[field] ?? null;
    return a === b ? [] : [{ field, before: a, after: b }];
  });
}
