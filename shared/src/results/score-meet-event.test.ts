import { describe, expect, it } from '@jest/globals';

import { eventScheme, scoreMeetEvent, type EventScoring, type MeetScoring, type StoredResult } from './score-meet-event.js';

const meet: MeetScoring = { scoringScheme: 'FIXED_TABLE', pointsTable: [7, 6, 5, 4, 3, 2, 1], bestEntryPerClub: false, minimumOnePoint: false, runOffTopPlaces: 0 };
const timed: EventScoring = { kind: 'TIMED', scoringScheme: null, pointsTable: null, weight: 1, timeLimitHundredths: null };
const result = (id: string, clubId: string, over: Partial<StoredResult> = {}): StoredResult => ({
  id, clubId, status: 'FINISHED', timeHundredths: 4000, score: null, penaltyHundredths: 0, reason: null, runOffRank: null, ...over,
});
const byId = (event: ReturnType<typeof scoreMeetEvent>) => Object.fromEntries(event.results.map((r) => [r.id, [r.place, r.points, r.status]]));

describe('scoreMeetEvent', () => {
  it('splits the points of the places two tied athletes cover, with penalties in hundredths', () => {
    // REFERENCES.md, fixed table 7-6-5-4-3-2-1, tied places split points. Hand-worked: a = 40.00 + 5 s
    // penalty = 45.00 ties b = 45.00 for 1st, (7 + 6) / 2 = 6.5 each; c at 46.00 is 3rd with 5.
    const scored = scoreMeetEvent([
      result('a', 'x', { timeHundredths: 4000, penaltyHundredths: 500 }),
      result('b', 'y', { timeHundredths: 4500 }),
      result('c', 'z', { timeHundredths: 4600 }),
    ], timed, meet);
    expect(byId(scored)).toEqual({ a: [1, 6.5, 'finished'], b: [1, 6.5, 'finished'], c: [3, 5, 'finished'] });
  });

  it('turns an over-limit run into a DQ that earns nothing, and weighs the event', () => {
    // DESIGN.md: a time limit turns an over-limit run into a DQ; DQ earns nothing; weights like ×1.5.
    // Hand-worked: b is 1st (7 × 1.5 = 10.5), c 2nd (6 × 1.5 = 9), a over 60.00 → DQ, 0.
    const scored = scoreMeetEvent(
      [result('a', 'x', { timeHundredths: 6001 }), result('b', 'y', { timeHundredths: 5000 }), result('c', 'z', { timeHundredths: 5500 })],
      { ...timed, weight: 1.5, timeLimitHundredths: 6000 },
      { ...meet, minimumOnePoint: true },
    );
    expect(byId(scored)).toEqual({ a: [null, 0, 'disqualified'], b: [1, 10.5, 'finished'], c: [2, 9, 'finished'] });
  });

  it("scores only a club's best entry when the host asks, moving the next club up", () => {
    // REFERENCES.md: each school scores once per event (7-6-5-…). Hand-worked: x1 1st 7, x2 earns 0,
    // y1 takes the 2nd points place, 6.
    const scored = scoreMeetEvent(
      [result('x1', 'x', { timeHundredths: 3000 }), result('x2', 'x', { timeHundredths: 3100 }), result('y1', 'y', { timeHundredths: 3200 })],
      timed,
      { ...meet, bestEntryPerClub: true },
    );
    expect(byId(scored)).toEqual({ x1: [1, 7, 'finished'], x2: [2, 0, 'finished'], y1: [3, 6, 'finished'] });
  });

  it('reads a fewest-hits event as fewer wins with time breaking the tie', () => {
    // DESIGN.md: fewest hits, time breaks ties. Hand-worked: b 3 hits 1st; a and c 4 hits, a faster → 2nd.
    const hits: EventScoring = { ...timed, kind: 'FEWEST_HITS' };
    const scored = scoreMeetEvent([
      result('a', 'x', { score: 4, timeHundredths: 1500 }),
      result('b', 'y', { score: 3, timeHundredths: 2000 }),
      result('c', 'z', { score: 4, timeHundredths: 1600 }),
    ], hits, meet);
    expect(byId(scored)).toEqual({ a: [2, 6, 'finished'], b: [1, 7, 'finished'], c: [3, 5, 'finished'] });
  });

  it("uses an event's own scheme over the meet's", () => {
    // DESIGN.md: field size, 1st earns as many points as there are clubs; here 2 clubs → 2, 1.
    expect(eventScheme(meet, { ...timed, scoringScheme: 'FIELD_SIZE' })).toEqual({ type: 'field-size', countBy: 'clubs' });
    expect(eventScheme(meet, { ...timed, scoringScheme: 'FIXED_TABLE', pointsTable: [5, 4, 3, 2, 1, 0] })).toEqual({ type: 'place-table', points: [5, 4, 3, 2, 1, 0] });
    expect(eventScheme(meet, timed)).toEqual({ type: 'place-table', points: [7, 6, 5, 4, 3, 2, 1] });
    const scored = scoreMeetEvent([result('a', 'x', { timeHundredths: 3000 }), result('b', 'y', { timeHundredths: 3100 })], { ...timed, scoringScheme: 'FIELD_SIZE' }, meet);
    expect(byId(scored)).toEqual({ a: [1, 2, 'finished'], b: [2, 1, 'finished'] });
  });
});
