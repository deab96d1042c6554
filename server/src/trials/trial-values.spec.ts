import { describe, expect, it } from '@jest/globals';

import type { SaveTrialInput } from './dto/save-trial.input.js';
import { TrialConditionEnum } from './models/trials.enums.js';
import { trialValues } from './trial-values.js';

const T1 = '11111111-1111-4111-8111-111111111111';
const AXE = '22222222-2222-4222-8222-222222222222';
const RUN = '33333333-3333-4333-8333-333333333333';
const NOW = new Date('2026-11-10T12:00:00Z');

const input = (over: Partial<SaveTrialInput> = {}): SaveTrialInput => ({
  id: '44444444-4444-4444-8444-444444444444',
  clubId: '55555555-5555-4555-8555-555555555555',
  saveToken: 'token-1',
  testedOn: '2026-11-10',
  speciesId: 'quaking-aspen',
  diameterMm: 304.8,
  condition: TrialConditionEnum.GREEN,
  knots: '',
  faceUsed: '',
  referenceAxeId: AXE,
  notes: '',
  testers: [{ id: T1, name: '  Maren   Ashgrove ' }],
  runs: [{ id: RUN, axeId: AXE, testerId: T1, swings: [{ depthMm: 30, opening: false }], feel: '', notes: '' }],
  ...over,
});

const fieldOf = (over: Partial<SaveTrialInput>): string | undefined => {
  try {
    trialValues(input(over), NOW);
    return undefined;
  } catch (e) {
    return (e as { options?: { field?: string } }).options?.field;
  }
};

describe('trialValues', () => {
  it('keeps a well-formed trial and tidies tester names', () => {
    const values = trialValues(input(), NOW);
    expect(values.testers[0]!.name).toBe('Maren Ashgrove');
    // 12 in = 304.8 mm exactly (NIST SP 811, App. B.8), kept to 0.1 mm.
    expect(values.diameterMm).toBe(304.8);
    expect(values.runs[0]!.swings).toEqual([{ depthMm: 30, opening: false }]);
  });

  it('names the field of each mistake', () => {
    expect(fieldOf({ speciesId: 'ironwood' })).toBe('speciesId');
    // 12 typed into the millimetre box for a 12-inch block: below the 100 mm bound.
    expect(fieldOf({ diameterMm: 12 })).toBe('diameterMm');
    expect(fieldOf({ testedOn: '2026-11-20' })).toBe('testedOn');
    expect(fieldOf({ airTempC: 80 })).toBe('airTempC');
    expect(fieldOf({ testers: [] })).toBe('testers');
    expect(fieldOf({ testers: [{ id: T1, name: ' ' }] })).toBe('testers.0.name');
  });

  it('names the run and swing that is wrong', () => {
    const swing = (depthMm: number) => ({ runs: [{ id: RUN, axeId: AXE, testerId: T1, swings: [{ depthMm: 30, opening: false }, { depthMm, opening: false }], feel: '', notes: '' }] });
    expect(fieldOf(swing(450))).toBe('runs.0.swings.1.depthMm');
    expect(fieldOf(swing(-1))).toBe('runs.0.swings.1.depthMm');
    const other = '66666666-6666-4666-8666-666666666666';
    expect(fieldOf({ runs: [{ id: RUN, axeId: AXE, testerId: other, swings: [], feel: '', notes: '' }] })).toBe('runs.0.testerId');
    expect(fieldOf({ runs: [{ id: RUN, axeId: AXE, testerId: T1, swings: [], releaseStep: 6, feel: '', notes: '' }] })).toBe('runs.0.releaseStep');
  });

  it('allows a test dated tomorrow by the server clock but not later', () => {
    // A phone east of the server may already be on the next day.
    expect(fieldOf({ testedOn: '2026-11-11' })).toBeUndefined();
    expect(fieldOf({ testedOn: '2026-11-12' })).toBe('testedOn');
  });
});
