import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { rankResults } from './rank-results.js';
import type { ResultInput, ResultKind } from './result-types.js';
import { scoreEvent } from './score-event.js';
import type { ScoringScheme } from './scoring-scheme.js';

// Few distinct times and scores so that ties are common.
const entry = fc.record({
  clubId: fc.constantFrom('ash', 'birch', 'cedar', 'elm'),
  status: fc.constantFrom('finished', 'finished', 'finished', 'finished', 'did-not-finish', 'disqualified', 'scratch'),
  timeHundredths: fc.integer({ min: 3000, max: 3005 }),
  score: fc.integer({ min: 0, max: 4 }),
  penaltySeconds: fc.constantFrom(0, 0, 0, 0.01, 1),
  runOffRank: fc.option(fc.integer({ min: 1, max: 2 })),
});
const field = fc
  .array(entry, { maxLength: 14 })
  .map((rows) => rows.map((row, index): ResultInput => ({ id: `r${String(index).padStart(2, '0')}`, ...row })));
const kind = fc.constantFrom<ResultKind>('timed', 'scored', 'fewest-hits');
const table = fc.array(fc.integer({ min: 0, max: 20 }), { maxLength: 10 });
const scheme: fc.Arbitrary<ScoringScheme> = fc.oneof(
  table.map((points) => ({ type: 'place-table' as const, points })),
  fc.constantFrom('clubs' as const, 'entries' as const).map((countBy) => ({ type: 'field-size' as const, countBy })),
  fc.constant({ type: 'percent-of-best' as const }),
);
const shuffled = field.chain((rows) =>
  fc.shuffledSubarray(rows, { minLength: rows.length, maxLength: rows.length }).map((order) => [rows, order] as const),
);
const sum = (values: number[]): number => values.reduce((total, value) => total + value, 0);

describe('scoring properties', () => {
  it('hands out exactly the table points of the places covered, however athletes tie', () => {
    // property: splitting a tie moves points between the tied, never creates or loses them; the
    // scoring placed results cover points places 1..n, so the total is the table's first n values
    // (within the two-decimal rounding of each result)
    fc.assert(
      fc.property(field, kind, table, fc.nat(3), fc.boolean(), (rows, eventKind, points, runOffs, best) => {
        const ranked = rankResults(rows, { kind: eventKind, runOffTopPlaces: runOffs });
        const scored = scoreEvent(ranked, { type: 'place-table', points }, { bestEntryPerClubOnly: best });
        const placed = scored.results.filter((result) => result.place !== null && result.countsForClub);
        const expected = sum(placed.map((_, index) => points[index] ?? 0));
        expect(Math.abs(sum(placed.map((result) => result.points)) - expected)).toBeLessThanOrEqual(
          0.005 * placed.length + 1e-9,
        );
      }),
    );
  });

  it('gives tied results the same points', () => {
    fc.assert(
      fc.property(field, kind, scheme, (rows, eventKind, chosen) => {
        const scored = scoreEvent(rankResults(rows, { kind: eventKind }), chosen);
        for (const result of scored.results.filter((one) => one.place !== null)) {
          const sharers = scored.results.filter((other) => other.place === result.place);
          expect(new Set(sharers.map((other) => other.points)).size).toBe(1);
        }
      }),
    );
  });

  it('ranks and scores the same whatever order the results arrive in', () => {
    fc.assert(
      fc.property(shuffled, kind, scheme, fc.boolean(), fc.boolean(), ([rows, order], eventKind, chosen, best, min) => {
        const options = { kind: eventKind, runOffTopPlaces: 2, timeLimitHundredths: 3004 };
        const scoring = { bestEntryPerClubOnly: best, minimumOnePoint: min, weight: 1.5 };
        expect(scoreEvent(rankResults(order, options), chosen, scoring)).toEqual(
          scoreEvent(rankResults(rows, options), chosen, scoring),
        );
      }),
    );
  });

  it('lists places in non-decreasing order, each one after everyone strictly ahead', () => {
    // property: competition ranking — a place is 1 + the number of timed results strictly faster
    fc.assert(
      fc.property(field, (rows) => {
        const ranked = rankResults(rows, { kind: 'timed' }).results;
        const placed = ranked.filter((result) => result.place !== null);
        expect(ranked.slice(0, placed.length)).toEqual(placed);
        placed.forEach((result, index) => {
          expect(result.place).toBeGreaterThanOrEqual(placed[index - 1]?.place ?? 1);
          const ahead = placed.filter((other) => (other.totalHundredths ?? 0) < (result.totalHundredths ?? 0));
          expect(result.place).toBe(ahead.length + 1);
        });
      }),
    );
  });
});
