import { describe, expect, it } from '@jest/globals';

import { officialTime } from '../time/official-time.js';
import { rankResults } from './rank-results.js';
import type { ResultInput } from './result-types.js';
import { scoreEvent } from './score-event.js';
import { placeTablePresets } from './scoring-scheme.js';

const run = (id: string, clubId: string, timeHundredths: number): ResultInput => ({
  id,
  clubId,
  status: 'finished',
  timeHundredths,
});
const pointsOf = (results: { id: string; points: number }[]): Record<string, number> =>
  Object.fromEntries(results.map((result) => [result.id, result.points]));

describe('scoreEvent on a place table', () => {
  it('splits points between athletes tied for first and places the next one 3rd', () => {
    // product design rule: two tied for 1st on a 10-8 table get 9 each; the next athlete is 3rd.
    // hand-worked: (10 + 8) / 2 = 9; 3rd earns the table's third value, 6
    const ranked = rankResults([run('a', 'n', 4000), run('b', 'e', 4000), run('c', 'w', 4100)], { kind: 'timed' });
    const scored = scoreEvent(ranked, { type: 'place-table', points: [10, 8, 6] });
    expect(pointsOf(scored.results)).toEqual({ a: 9, b: 9, c: 6 });
    expect(scored.results.map((result) => result.place)).toEqual([1, 1, 3]);
  });

  it('gives 0 past the end of the 5-4-3-2-1-0 table, and 1 with the minimum point', () => {
    // fixed table 5-4-3-2-1-0 in use; 6th earns 0, 7th is past the table
    const ranked = rankResults(
      ['a', 'b', 'c', 'd', 'e', 'f', 'g'].map((id, index) => run(id, `club-${id}`, 4000 + index * 100)),
      { kind: 'timed' },
    );
    const plain = scoreEvent(ranked, { type: 'place-table', points: placeTablePresets.fiveToZero });
    expect(pointsOf(plain.results)).toEqual({ a: 5, b: 4, c: 3, d: 2, e: 1, f: 0, g: 0 });
    const floored = scoreEvent(
      ranked,
      { type: 'place-table', points: placeTablePresets.fiveToZero },
      { minimumOnePoint: true },
    );
    expect(pointsOf(floored.results)).toEqual({ a: 5, b: 4, c: 3, d: 2, e: 1, f: 1, g: 1 });
  });

  it('scores a 7-6-5-4-3-2-1 event with one scoring entry per club and a minimum point', () => {
    // fixed table 7-6-5-4-3-2-1: each school scores once per event, every school entering earns
    // at least 1 point, tied places split points, two stopwatch times averaged.
    // hand-worked: north-1 (30.10, 30.20 → 30.15) 1st; north-2 is north's second entry: placed
    // 2nd, no points place; east (31.00, 31.01 → 31.005 → 31.01 half up) ties west (31.01):
    // points places 2–3 → (6 + 5) / 2 = 5.5 each; pine 4, oak 3, elm 2, ash 1; fir is 8th on
    // points, past the table → 0, lifted to 1; south did not finish → lifted to 1; birch scratched → 0.
    const watches = (id: string, clubId: string, raw: number[]): ResultInput =>
      run(id, clubId, officialTime(raw).official);
    const results: ResultInput[] = [
      watches('north-1', 'north', [3010, 3020]),
      watches('north-2', 'north', [3050, 3060]),
      watches('east-1', 'east', [3100, 3101]),
      watches('west-1', 'west', [3101, 3101]),
      ...['pine', 'oak', 'elm', 'ash', 'fir'].map((club, index) => run(`${club}-1`, club, 3200 + index * 100)),
      { id: 'south-1', clubId: 'south', status: 'did-not-finish' },
      { id: 'birch-1', clubId: 'birch', status: 'scratch' },
    ];
    const scored = scoreEvent(
      rankResults(results, { kind: 'timed' }),
      { type: 'place-table', points: placeTablePresets.sevenToOne },
      { bestEntryPerClubOnly: true, minimumOnePoint: true },
    );
    expect(pointsOf(scored.results)).toEqual({
      'north-1': 7,
      'north-2': 0,
      'east-1': 5.5,
      'west-1': 5.5,
      'pine-1': 4,
      'oak-1': 3,
      'elm-1': 2,
      'ash-1': 1,
      'fir-1': 1,
      'south-1': 1,
      'birch-1': 0,
    });
    expect(scored.results.find((result) => result.id === 'north-2')).toMatchObject({
      place: 2,
      countsForClub: false,
      pointsPlace: null,
    });
    expect(scored.results.find((result) => result.id === 'pine-1')).toMatchObject({ place: 5, pointsPlace: 4 });
  });

  it('splits three ways and rounds to two decimals', () => {
    // hand-worked: three tied for 1st on 7-6-5-4-3-2-1 → (7 + 6 + 5) / 3 = 6 each;
    // three tied for 2nd on 7-6-4 → (6 + 4 + 0) / 3 = 3.333… → 3.33
    const tied = rankResults([run('a', 'x', 4000), run('b', 'y', 4000), run('c', 'z', 4000)], { kind: 'timed' });
    expect(pointsOf(scoreEvent(tied, { type: 'place-table', points: placeTablePresets.sevenToOne }).results)).toEqual({
      a: 6,
      b: 6,
      c: 6,
    });
    const second = rankResults([run('w', 'v', 3000), run('a', 'x', 4000), run('b', 'y', 4000), run('c', 'z', 4000)], {
      kind: 'timed',
    });
    expect(pointsOf(scoreEvent(second, { type: 'place-table', points: [7, 6, 4] }).results)).toEqual({
      w: 7,
      a: 3.33,
      b: 3.33,
      c: 3.33,
    });
  });
});

describe('scoreEvent on field-size points', () => {
  // southern forestry conclave's place-points rules (since 1968): 1st earns as many points as
  // there are schools, each lower place one less; a DQ earns none; technical events ×1.5;
  // ties below 3rd split the points of the places they cover; ties for 1st–3rd go to a run-off.
  const field: ResultInput[] = [
    run('a', 'ash', 4000),
    run('b', 'birch', 4100),
    run('c', 'cedar', 4100),
    run('d', 'dogwood', 4300),
    run('e', 'elm', 4300),
    run('f', 'fir', 4500),
    { id: 'g', clubId: 'gum', status: 'disqualified', reason: 'unsafe swing' },
  ];
  const scheme = { type: 'field-size', countBy: 'clubs' } as const;

  it('scores a technical event with a pending run-off for 2nd', () => {
    // hand-worked: 7 schools → 1st 7, 2nd 6 … 7th 1. b and c tie for 2nd: run-off pending, shared
    // provisionally (6 + 5) / 2 = 5.5; d and e tie for 4th: (4 + 3) / 2 = 3.5; f is 6th: 2; g DQ: 0.
    // ×1.5: 10.5, 8.25, 8.25, 5.25, 5.25, 3, 0
    const scored = scoreEvent(rankResults(field, { kind: 'timed', runOffTopPlaces: 3 }), scheme, { weight: 1.5 });
    expect(pointsOf(scored.results)).toEqual({ a: 10.5, b: 8.25, c: 8.25, d: 5.25, e: 5.25, f: 3, g: 0 });
    expect(scored.results.filter((result) => result.provisional).map((result) => result.id)).toEqual(['b', 'c']);
    expect(scored.provisional).toBe(true);
  });

  it('scores the run-off winner the higher place once it is run', () => {
    // hand-worked: c wins the run-off → c 2nd (6), b 3rd (5)
    const resolved = field.map((result) =>
      result.id === 'b' ? { ...result, runOffRank: 2 } : result.id === 'c' ? { ...result, runOffRank: 1 } : result,
    );
    const scored = scoreEvent(rankResults(resolved, { kind: 'timed', runOffTopPlaces: 3 }), scheme);
    expect(pointsOf(scored.results)).toEqual({ a: 7, c: 6, b: 5, d: 3.5, e: 3.5, f: 2, g: 0 });
    expect(scored.provisional).toBe(false);
  });

  it('counts entries instead of clubs when asked', () => {
    // hand-worked: two entries of one club → 2 clubs, 3 entries; by entries 1st earns 3, 2nd 2, 3rd 1
    const entries = [run('a', 'ash', 4000), run('b', 'ash', 4100), run('c', 'elm', 4200)];
    const ranked = rankResults(entries, { kind: 'timed' });
    const byEntries = scoreEvent(ranked, { type: 'field-size', countBy: 'entries' });
    expect(pointsOf(byEntries.results)).toEqual({ a: 3, b: 2, c: 1 });
    // by clubs 1st earns 2, 2nd 1, 3rd 0
    expect(pointsOf(scoreEvent(ranked, scheme).results)).toEqual({ a: 2, b: 1, c: 0 });
  });

  it('never gives fewer than 0 points to places past the field size', () => {
    // hand-worked: one club, three entries → 1st 1, 2nd 0, 3rd would be -1 → floored at 0
    const entries = [run('a', 'ash', 4000), run('b', 'ash', 4100), run('c', 'ash', 4200)];
    const ranked = rankResults(entries, { kind: 'timed' });
    expect(pointsOf(scoreEvent(ranked, scheme).results)).toEqual({ a: 1, b: 0, c: 0 });
  });
});

describe('scoreEvent on percentage of the best', () => {
  it('rounds each share to two decimals and gives a disqualified entry nothing', () => {
    // percentage scoring of a northeastern spring meet, our stated formula 100 × best ÷ own;
    // hand-worked: 100 × 40.00 ÷ 45.00 = 88.888… → 88.89
    const ranked = rankResults(
      [
        run('a', 'x', 4000),
        run('c', 'z', 4500),
        { id: 'q', clubId: 'y', status: 'disqualified', timeHundredths: 3000 },
      ],
      { kind: 'timed' },
    );
    expect(pointsOf(scoreEvent(ranked, { type: 'percent-of-best' }).results)).toEqual({ a: 100, c: 88.89, q: 0 });
  });
});

describe('scoreEvent host options', () => {
  const ranked = rankResults(
    [
      run('a', 'x', 4000),
      { id: 'q', clubId: 'y', status: 'disqualified' },
      { id: 'n', clubId: 'z', status: 'did-not-finish' },
    ],
    { kind: 'timed' },
  );
  const table = { type: 'place-table', points: placeTablePresets.sevenToOne } as const;

  it('gives a disqualified entry nothing by default, even with the minimum point', () => {
    expect(pointsOf(scoreEvent(ranked, table, { minimumOnePoint: true }).results)).toEqual({ a: 7, n: 1, q: 0 });
  });

  it('owes a disqualified entry the minimum point when DQ does not mean nothing', () => {
    const scored = scoreEvent(ranked, table, { minimumOnePoint: true, dqEarnsNothing: false });
    expect(pointsOf(scored.results)).toEqual({ a: 7, n: 1, q: 1 });
  });

  it('weights the minimum point like any place point', () => {
    // our rule: the minimum is a place point, so ×1.5 → 1.5; hand-worked 7 × 1.5 = 10.5
    expect(pointsOf(scoreEvent(ranked, table, { minimumOnePoint: true, weight: 1.5 }).results)).toEqual({
      a: 10.5,
      n: 1.5,
      q: 0,
    });
  });

  it('refuses a weight of zero', () => {
    expect(() => scoreEvent(ranked, table, { weight: 0 })).toThrow('an event weight is a positive number');
  });
});
