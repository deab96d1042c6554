import { describe, expect, it } from '@jest/globals';

import { rankResults } from './rank-results.js';
import type { ResultInput } from './result-types.js';
import { ScoringInputError } from './scoring-input-error.js';

const run = (id: string, timeHundredths: number, more: Partial<ResultInput> = {}): ResultInput => ({
  id,
  clubId: `club-${id}`,
  status: 'finished',
  timeHundredths,
  ...more,
});
const places = (results: { id: string; place: number | null }[]): [string, number | null][] =>
  results.map((result) => [result.id, result.place]);

describe('rankResults for timed events', () => {
  it('ranks lower times first and skips the place after a tie', () => {
    // hand-worked: 45.20 = 45.20 < 46.00 < 47.10 → 1, 1, 3, 4 (two tied for 1st → next is 3rd)
    const ranked = rankResults([run('c', 4600), run('b', 4520), run('d', 4710), run('a', 4520)], { kind: 'timed' });
    expect(places(ranked.results)).toEqual([['a', 1], ['b', 1], ['c', 3], ['d', 4]]);
    expect(ranked.results.map((result) => result.tied)).toEqual([true, true, false, false]);
  });

  it('adds penalty seconds to the time', () => {
    // hand-worked: 45.00 + 2 s penalty = 47.00, slower than a clean 46.00
    const ranked = rankResults([run('a', 4500, { penaltySeconds: 2 }), run('b', 4600)], { kind: 'timed' });
    expect(places(ranked.results)).toEqual([['b', 1], ['a', 2]]);
    expect(ranked.results[1]).toMatchObject({ timeHundredths: 4500, penaltyHundredths: 200, totalHundredths: 4700 });
  });

  it('disqualifies a run over the time limit but not one exactly on it', () => {
    // hand-worked: limit 3:00.00 = 18000 hundredths; 18001 is over it, 18000 is not
    const ranked = rankResults([run('over', 18001), run('on', 18000)], { kind: 'timed', timeLimitHundredths: 18000 });
    expect(ranked.results[0]).toMatchObject({ id: 'on', place: 1, status: 'finished' });
    expect(ranked.results[1]).toMatchObject({
      id: 'over',
      place: null,
      status: 'disqualified',
      reason: 'over time limit',
    });
  });

  it('judges the time limit on the run before penalties', () => {
    // our rule: 179.00 s run + 5 s penalty = 184.00 s total, the run itself is inside 180 s
    const ranked = rankResults([run('a', 17900, { penaltySeconds: 5 })], { kind: 'timed', timeLimitHundredths: 18000 });
    expect(ranked.results[0]).toMatchObject({ status: 'finished', place: 1, totalHundredths: 18400 });
  });

  it('lists finished results first, then did-not-finish, disqualified and scratch without a place', () => {
    const ranked = rankResults(
      [
        { id: 's', clubId: 'x', status: 'scratch' },
        { id: 'q', clubId: 'x', status: 'disqualified', timeHundredths: 4000, reason: 'foot over the line' },
        { id: 'n', clubId: 'x', status: 'did-not-finish' },
        run('f', 5000),
      ],
      { kind: 'timed' },
    );
    expect(places(ranked.results)).toEqual([['f', 1], ['n', null], ['q', null], ['s', null]]);
    expect(ranked.results[2]?.reason).toBe('foot over the line');
  });
});

describe('rankResults for scored and fewest-hits events', () => {
  // collegiate axe-throw rules: rings score 5-4-3-2-1, both bits stuck scores 0
  const rings = (...throws: number[]): number => throws.reduce((sum, points) => sum + points, 0);

  it('ranks higher scores first', () => {
    // hand-worked: 5+4+3 = 12 beats 5+5+0 = 10 beats 3+3+3 = 9
    const ranked = rankResults(
      [
        { id: 'b', clubId: 'x', status: 'finished', score: rings(5, 5, 0) },
        { id: 'a', clubId: 'x', status: 'finished', score: rings(5, 4, 3) },
        { id: 'c', clubId: 'x', status: 'finished', score: rings(3, 3, 3) },
      ],
      { kind: 'scored' },
    );
    expect(places(ranked.results)).toEqual([['a', 1], ['b', 2], ['c', 3]]);
  });

  it('breaks a score tie by time when every tied result has one', () => {
    // hand-worked: both 12 points; 31.00 s beats 33.50 s
    const ranked = rankResults(
      [
        { id: 'slow', clubId: 'x', status: 'finished', score: 12, timeHundredths: 3350 },
        { id: 'quick', clubId: 'x', status: 'finished', score: 12, timeHundredths: 3100 },
      ],
      { kind: 'scored' },
    );
    expect(places(ranked.results)).toEqual([['quick', 1], ['slow', 2]]);
  });

  it('shares the place when a tied result has no time', () => {
    const ranked = rankResults(
      [
        { id: 'a', clubId: 'x', status: 'finished', score: 12, timeHundredths: 3100 },
        { id: 'b', clubId: 'x', status: 'finished', score: 12 },
        { id: 'c', clubId: 'x', status: 'finished', score: 9, timeHundredths: 2000 },
      ],
      { kind: 'scored' },
    );
    expect(places(ranked.results)).toEqual([['a', 1], ['b', 1], ['c', 3]]);
  });

  it('ranks fewer hits first and lets time break a tie', () => {
    // hand-worked: 14 hits < 15 hits; of the two at 15, 52.00 s beats 55.00 s
    const ranked = rankResults(
      [
        { id: 'b', clubId: 'x', status: 'finished', score: 15, timeHundredths: 5500 },
        { id: 'a', clubId: 'x', status: 'finished', score: 15, timeHundredths: 5200 },
        { id: 'c', clubId: 'x', status: 'finished', score: 14, timeHundredths: 6000 },
      ],
      { kind: 'fewest-hits' },
    );
    expect(places(ranked.results)).toEqual([['c', 1], ['a', 2], ['b', 3]]);
  });
});

describe('rankResults with run-offs', () => {
  // southern forestry conclave's place-points rules: ties for 1st–3rd go to a run-off,
  // ties below 3rd split the points and the next place is skipped
  const field = [run('a', 4000), run('b', 4100), run('c', 4100), run('d', 4300), run('e', 4300), run('f', 4500)];

  it('flags a tie in the top places for a run-off and shares the place meanwhile', () => {
    const ranked = rankResults(field, { kind: 'timed', runOffTopPlaces: 3 });
    expect(places(ranked.results)).toEqual([['a', 1], ['b', 2], ['c', 2], ['d', 4], ['e', 4], ['f', 6]]);
    expect(ranked.results.map((result) => result.needsRunOff)).toEqual([false, true, true, false, false, false]);
    expect(ranked.runOffsPending).toBe(true);
  });

  it('flags a tie that starts inside the run-off places even if it reaches past them', () => {
    // hand-worked: b and c tie for 3rd, covering 3rd and 4th; 3rd is in the top 3
    const ranked = rankResults([run('x', 3000), run('y', 3500), run('b', 4100), run('c', 4100)], {
      kind: 'timed',
      runOffTopPlaces: 3,
    });
    expect(ranked.results.map((result) => [result.id, result.place, result.needsRunOff])).toEqual([
      ['x', 1, false],
      ['y', 2, false],
      ['b', 3, true],
      ['c', 3, true],
    ]);
  });

  it('splits the tie by the run-off order once every tied result has one', () => {
    const resolved = field.map((result) =>
      result.id === 'b' ? { ...result, runOffRank: 2 } : result.id === 'c' ? { ...result, runOffRank: 1 } : result,
    );
    const ranked = rankResults(resolved, { kind: 'timed', runOffTopPlaces: 3 });
    expect(places(ranked.results)).toEqual([['a', 1], ['c', 2], ['b', 3], ['d', 4], ['e', 4], ['f', 6]]);
    expect(ranked.runOffsPending).toBe(false);
  });

  it('flags a tie again when the run-off itself ends level', () => {
    // hand-worked: three tied for 1st; run-off order 1, 2, 2 → winner 1st, the other two tie for
    // 2nd, still inside the top 3, so they need another run-off
    const tied = [
      run('p', 4000, { runOffRank: 2 }),
      run('q', 4000, { runOffRank: 1 }),
      run('r', 4000, { runOffRank: 2 }),
    ];
    const ranked = rankResults(tied, { kind: 'timed', runOffTopPlaces: 3 });
    expect(ranked.results.map((result) => [result.id, result.place, result.needsRunOff])).toEqual([
      ['q', 1, false],
      ['p', 2, true],
      ['r', 2, true],
    ]);
  });

  it('keeps a tie open while only some tied results have a run-off rank', () => {
    const partial = field.map((result) => (result.id === 'b' ? { ...result, runOffRank: 1 } : result));
    const ranked = rankResults(partial, { kind: 'timed', runOffTopPlaces: 3 });
    expect(ranked.results.filter((result) => result.needsRunOff).map((result) => result.id)).toEqual(['b', 'c']);
  });

  it('shares ties outside the run-off places without a flag', () => {
    const ranked = rankResults(field, { kind: 'timed', runOffTopPlaces: 1 });
    expect(ranked.results.some((result) => result.needsRunOff)).toBe(false);
    expect(ranked.runOffsPending).toBe(false);
  });
});

describe('rankResults refuses bad input', () => {
  it('refuses a duplicate id', () => {
    expect(() => rankResults([run('a', 4000), run('a', 4100)], { kind: 'timed' })).toThrow(ScoringInputError);
  });

  it('refuses a finished timed result without a time', () => {
    expect(() => rankResults([{ id: 'a', clubId: 'x', status: 'finished' }], { kind: 'timed' })).toThrow(
      'result a: a finished timed result needs a time',
    );
  });

  it('refuses fractional hits and a time in seconds instead of hundredths', () => {
    const hits = { id: 'a', clubId: 'x', status: 'finished', score: 14.5 } as const;
    expect(() => rankResults([hits], { kind: 'fewest-hits' })).toThrow(ScoringInputError);
    expect(() => rankResults([run('a', 45.2)], { kind: 'timed' })).toThrow(ScoringInputError);
  });
});
