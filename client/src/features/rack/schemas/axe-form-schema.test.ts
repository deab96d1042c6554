import { describe, expect, it } from '@jest/globals';

import { axeFormDefaults, axeFormSchema, toAxeInput } from './axe-form-schema.js';

const filled = (over: Record<string, unknown> = {}) => ({
  ...axeFormDefaults('IMPERIAL'),
  label: 'Race 3',
  grind: 'CHISEL' as const,
  bevelIncluded: '15',
  chiselWidth: '3/4',
  headWeight: '5.5',
  bitWidth: '5 1/4',
  handleLength: '30',
  ...over,
});

describe('the add-axe form', () => {
  it('sends what a coach types in inches and pounds as millimetres and grams', () => {
    const input = toAxeInput(axeFormSchema.parse(filled()));
    // Exact factors (NIST SP 811, App. B.8): ¾ in × 25.4 = 19.05 mm; 5¼ in × 25.4 = 133.35 mm;
    // 30 in × 25.4 = 762 mm; 5.5 lb × 453.59237 g = 2494.758 g → 2495 g (whole grams).
    expect(input).toMatchObject({ chiselWidthMm: 19.05, bitWidthMm: 133.35, handleLengthMm: 762, headWeightG: 2495, bevelIncludedDeg: 15 });
  });

  it('reads kilograms and millimetres as they are', () => {
    const input = toAxeInput(axeFormSchema.parse(filled({ units: 'METRIC', headWeight: '2.5', chiselWidth: '19.05', bitWidth: '', handleLength: '' })));
    // hand-worked: 2.5 kg = 2500 g; empty boxes are "not recorded" (null), not zero.
    expect(input).toMatchObject({ headWeightG: 2500, chiselWidthMm: 19.05, bitWidthMm: null, handleLengthMm: null });
  });

  it('puts a chisel width on a flat grind and a bevel out of range beside their boxes', () => {
    const result = axeFormSchema.safeParse(filled({ grind: 'FLAT', bevelIncluded: '75' }));
    expect(result.success).toBe(false);
    const paths = result.error?.issues.map((issue) => issue.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['chiselWidth', 'bevelIncluded']));
  });

  it('refuses words where a number belongs', () => {
    expect(axeFormSchema.safeParse(filled({ headWeight: 'heavy' })).success).toBe(false);
  });

  it('shows a stored axe back in the reader\'s units', () => {
    const values = axeFormDefaults('IMPERIAL', {
      geometry: { includedAngleDeg: 15, perSideAngleDeg: 7.5, chiselWidthMm: 19.05, shoulderThicknessMm: 5.016 },
      headWeightG: 2495,
      bitWidthMm: 133.35,
      handleLengthMm: 762,
    } as never);
    // 19.05 mm ÷ 25.4 = 0.75 in; 2495 g ÷ 453.59237 = 5.5005 lb → "5.501" (three decimals); 762 mm = 30 in.
    expect(values).toMatchObject({ chiselWidth: '0.75', headWeight: '5.501', bitWidth: '5.25', handleLength: '30', bevelIncluded: '15' });
  });
});
