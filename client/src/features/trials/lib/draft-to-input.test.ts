import { describe, expect, it } from '@jest/globals';

import { completeDraft } from '../testing/trial-fixtures.js';
import { draftToInput, isFreezing, lengthInMm } from './draft-to-input.js';
import { newDraft } from './trial-draft.js';

describe('lengthInMm', () => {
  it('reads the number with the unit chosen beside it', () => {
    // 1 in = 25.4 mm exactly (NIST SP 811, App. B.8): 12 in = 304.8 mm; 12 1/2 in = 317.5 mm.
    expect(lengthInMm('12', 'in')).toBeCloseTo(304.8, 10);
    expect(lengthInMm('12 1/2', 'in')).toBeCloseTo(317.5, 10);
    // A decimal comma, as many phone keypads type it.
    expect(lengthInMm('304,8', 'mm')).toBeCloseTo(304.8, 10);
    expect(lengthInMm('', 'mm')).toBeNull();
    expect(lengthInMm('twelve', 'in')).toBeNull();
  });
});

describe('draftToInput', () => {
  it('names everything a new draft still needs before it can be sent', () => {
    const check = draftToInput(newDraft('club', { today: '2026-10-03', units: 'METRIC', now: '2026-10-03T10:00:00Z' }));
    expect(check.ok).toBe(false);
    expect(check.ok ? [] : check.problems.map((p) => p.field)).toEqual(['speciesId', 'diameter', 'condition', 'referenceAxeId', 'testers']);
  });

  it('sends millimetres and the tokens the server needs to spot a resend', () => {
    const check = draftToInput(completeDraft({ airTempText: '−3', unansweredToken: 'token-0' }));
    expect(check.ok).toBe(true);
    if (!check.ok) return;
    expect(check.input.diameterMm).toBeCloseTo(304.8, 10);
    // A typographic minus is still below zero.
    expect(check.input.airTempC).toBe(-3);
    expect(check.input).toMatchObject({ saveToken: 'token-1', unansweredToken: 'token-0', baseVersion: null });
  });

  it('refuses an air temperature that is not a number', () => {
    const check = draftToInput(completeDraft({ airTempText: 'cold' }));
    expect(check.ok ? [] : check.problems.map((p) => p.field)).toEqual(['airTemp']);
  });
});

describe('isFreezing', () => {
  it('warns at or below 0 °C and on a frozen block, not above', () => {
    expect(isFreezing({ condition: 'GREEN', airTempText: '0' })).toBe(true);
    expect(isFreezing({ condition: 'GREEN', airTempText: '-4' })).toBe(true);
    expect(isFreezing({ condition: 'FROZEN', airTempText: '' })).toBe(true);
    expect(isFreezing({ condition: 'GREEN', airTempText: '0.5' })).toBe(false);
  });
});
