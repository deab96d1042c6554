import { describe, expect, it } from '@jest/globals';

import type { MeetScoring } from '../api/types.js';
import { describeScoring } from './describe-scoring.js';

const base: MeetScoring = {
  scoringScheme: 'FIXED_TABLE',
  pointsTable: [7, 6, 5, 4, 3, 2, 1],
  bestEntryPerClub: false,
  minimumOnePoint: false,
  runOffTopPlaces: 0,
  maxEventsPerAthlete: null,
  requireMixedPairs: false,
};

describe('describeScoring', () => {
  it('spells out a fixed table place by place', () => {
    // the 7-6-5-4-3-2-1 table in use at collegiate meets, read out with ordinals
    expect(describeScoring(base)[0]).toBe(
      'Places earn points from a fixed table: 1st 7, 2nd 6, 3rd 5, 4th 4, 5th 3, 6th 2, 7th 1. Lower places earn nothing.',
    );
  });

  it('explains field-size points and says ties split points when there are no run-offs', () => {
    const lines = describeScoring({ ...base, scoringScheme: 'FIELD_SIZE', pointsTable: null });
    // field-size rule: 1st earns as many points as there are clubs, each place one less
    expect(lines[0]).toMatch(/as many points as there are clubs/);
    expect(lines[1]).toBe('Tied athletes share the place and split the points of the places they cover.');
  });

  it('names the percentage formula as our own choice', () => {
    expect(describeScoring({ ...base, scoringScheme: 'PERCENT_OF_BEST', pointsTable: null })[0]).toMatch(
      /100 × best time ÷ own time.*our stated choice/,
    );
  });

  it('lists every option the host switched on', () => {
    const lines = describeScoring({
      ...base,
      bestEntryPerClub: true,
      minimumOnePoint: true,
      runOffTopPlaces: 3,
      maxEventsPerAthlete: 1,
      requireMixedPairs: true,
    });
    expect(lines).toEqual([
      expect.stringContaining('fixed table'),
      'Ties for the top 3 places are settled by a run-off; lower ties share the place and split its points.',
      "Only each club's best entry in an event scores.",
      'Every club that enters an event earns at least 1 point in it.',
      'A disqualification earns nothing.',
      'Each athlete may enter at most 1 event.',
      'Mixed pairs are one woman and one man.',
    ]);
  });

  it('uses 11th to 13th, not 11st', () => {
    const table = [13, 12, 11, 10, 9, 8, 7, 6, 5, 4, 3, 2, 1];
    expect(describeScoring({ ...base, pointsTable: table })[0]).toContain('11th 3, 12th 2, 13th 1');
  });
});
