import { describe, expect, it } from '@jest/globals';

import type { Result } from '../api/types.js';
import { draftFrom, draftToInput, type EntryDraft } from './entry-draft.js';

const timed = { resultKind: 'TIMED' as const, usesHead: true };
const draft = (over: Partial<EntryDraft> = {}): EntryDraft => ({ ...draftFrom(undefined, 'METRIC'), ...over });

describe('draftToInput', () => {
  it('sends the watch times as typed, with the head in millimetres', () => {
    // 1/4 in = 6.35 mm exactly (NIST SP 811); a bare number is read in the reader's unit.
    const out = draftToInput('e1', draft({ times: ['41.37', '41.52', ''], grind: 'CONVEX', bevel: '32', chisel: '0.25', condition: 'SEASONED' }), timed, 'IMPERIAL');
    expect(out).toEqual({
      ok: true,
      input: {
        entryId: 'e1', status: 'FINISHED', times: ['41.37', '41.52'], score: null, penaltySeconds: 0, dqReason: null,
        axeId: null, axeLabel: null, grind: 'CONVEX', bevelIncludedDeg: 32, chiselWidthMm: 6.35, condition: 'SEASONED',
      },
    });
  });

  it('names the cell of a bad time and a missing reason', () => {
    expect(draftToInput('e1', draft({ times: ['1:5.3', '', ''] }), timed, 'METRIC')).toEqual({ ok: false, errors: { time0: '"1:5.3" is not m:ss.hh' } });
    expect(draftToInput('e1', draft({ status: 'DISQUALIFIED' }), timed, 'METRIC')).toEqual({ ok: false, errors: { dqReason: 'Say why' } });
  });

  it('asks a finished run for a time and a scored event for its score', () => {
    expect(draftToInput('e1', draft(), timed, 'METRIC')).toEqual({ ok: false, errors: { time0: 'A finished run needs a time' } });
    expect(draftToInput('e1', draft(), { resultKind: 'SCORED', usesHead: false }, 'METRIC')).toEqual({ ok: false, errors: { score: 'Type the score' } });
    expect(draftToInput('e1', draft({ status: 'SCRATCH' }), timed, 'METRIC')).toMatchObject({ ok: true, input: { status: 'SCRATCH', times: [] } });
  });
});

describe('draftFrom', () => {
  it('shows a saved result as it was typed', () => {
    // Hand-worked: 4137 hundredths print as 41.37; a 500-hundredth penalty is 5 s; 6.35 mm is 0.25 in.
    const saved = { rawTimes: [4137, 4152], score: null, penaltyHundredths: 500, postedStatus: 'FINISHED', reason: null, axeId: null, axeLabel: 'Race 3',
      grind: 'CHISEL', bevelIncludedDeg: 30, chiselWidthMm: 6.35, condition: 'DRY' } as unknown as Result;
    expect(draftFrom(saved, 'IMPERIAL')).toEqual({
      times: ['41.37', '41.52', ''], score: '', penalty: '5', status: 'FINISHED', dqReason: '', axeId: '', axeLabel: 'Race 3',
      grind: 'CHISEL', bevel: '30', chisel: '0.25', condition: 'DRY',
    });
  });
});
