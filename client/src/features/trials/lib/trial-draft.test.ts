import { describe, expect, it } from '@jest/globals';

import { completeDraft, testTrial } from '../testing/trial-fixtures.js';
import { newId } from './new-id.js';
import { changed, draftFromTrial } from './trial-draft.js';

describe('trial drafts', () => {
  it('gives every change a new save token and marks it as kept on the phone', () => {
    const sent = completeDraft({ sync: 'sent', problem: 'old' });
    const next = changed(sent, { knots: 'one pin knot' }, '2026-10-03T10:05:00.000Z');
    expect(next.saveToken).not.toBe(sent.saveToken);
    expect(next).toMatchObject({ sync: 'unsent', problem: null, knots: 'one pin knot', changedAt: '2026-10-03T10:05:00.000Z' });
  });

  it("starts an edit from the server's copy, diameter in the reader's unit", () => {
    // 304.8 mm = 12 in exactly (NIST SP 811).
    expect(draftFromTrial(testTrial(), { units: 'IMPERIAL', now: 'x' })).toMatchObject({ diameterText: '12', diameterUnit: 'in', baseVersion: 1, sync: 'sent' });
    expect(draftFromTrial(testTrial(), { units: 'METRIC', now: 'x' })).toMatchObject({ diameterText: '304.8', diameterUnit: 'mm', airTempText: '7' });
  });

  it('names things with version 4 UUIDs the server accepts', () => {
    const a = newId();
    expect(a).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(newId()).not.toBe(a);
  });
});
