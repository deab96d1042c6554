import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import type { TrialAxeRow } from './summarise-trial.js';
import { RELEASE_SCALE, type ReleaseId } from './trial-types.js';
import { trialVerdict } from './trial-verdict.js';

function row(axeId: string, meanMm: number | null, release: ReleaseId | null, counted = 4): TrialAxeRow {
  return {
    axeId,
    axeLabel: axeId,
    isReference: false,
    head: null,
    testers: ['Ana'],
    depth: { counted: meanMm === null ? 0 : counted, openingExcluded: 0, meanMm, sdMm: null, minMm: null, maxMm: null },
    ratioToReference: null,
    sameTesterRatio: null,
    testersWithoutReference: [],
    release,
    keenness: 'keen',
    notes: [],
  };
}

describe('trialVerdict', () => {
  it('flags an unrated release and a thin row without moving them', () => {
    // Rule: an unrated axe is not treated as binding; 2 counted swings < 3 is thin.
    const verdict = trialVerdict([row('a', 30, null), row('b', 28, 'release-4', 2)]);
    expect(verdict.map((r) => [r.axeId, r.verdictPlace, r.flags])).toEqual([
      ['a', 1, ['release-not-recorded']],
      ['b', 2, ['few-swings']],
    ]);
  });

  it('does not flag a binding axe that was shallower anyway', () => {
    // Hand-worked: binding 'b' at 20 mm ranks below 'a' at 30 mm by depth too; nothing moved.
    const verdict = trialVerdict([row('b', 20, 'release-2'), row('a', 30, 'release-5')]);
    expect(verdict.map((r) => [r.axeId, r.flags])).toEqual([
      ['a', []],
      ['b', ['binds']],
    ]);
  });

  it('puts an axe with no counted swing last without a place', () => {
    const verdict = trialVerdict([row('a', null, 'release-3'), row('b', 25, 'release-3')]);
    expect(verdict.map((r) => [r.axeId, r.verdictPlace])).toEqual([['b', 1], ['a', null]]);
    expect(verdict[1]!.flags).toContain('no-counted-swings');
  });

  it('never places a binding axe above a free-releasing one, whatever the depths', () => {
    const releaseIds = RELEASE_SCALE.map((s) => s.id);
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 5, max: 60 }), fc.constantFrom(...releaseIds)), { minLength: 1, maxLength: 8 }),
        (axes) => {
          const verdict = trialVerdict(axes.map(([depth, release], i) => row(`axe-${i}`, depth, release)));
          const step = (id: ReleaseId | null) => RELEASE_SCALE.find((s) => s.id === id)!;
          return verdict.every((a) =>
            verdict.every((b) => !(step(a.release).binds && step(b.release).free && a.verdictPlace! <= b.verdictPlace!)),
          );
        },
      ),
    );
  });
});
