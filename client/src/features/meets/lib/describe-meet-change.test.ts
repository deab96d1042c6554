import { describe, expect, it } from '@jest/globals';

import type { MeetScoring } from '../api/types.js';
import { describeMeetChange } from './describe-meet-change.js';

const meet: MeetScoring = { scoringScheme: 'FIXED_TABLE', pointsTable: [5, 4, 3, 2, 1, 0], bestEntryPerClub: false, minimumOnePoint: false, runOffTopPlaces: 0, maxEventsPerAthlete: 3, requireMixedPairs: true };

describe('describeMeetChange', () => {
  it('gives only the scoring sentences that changed', () => {
    const before = JSON.stringify({ scoringScheme: 'FIXED_TABLE', pointsTable: [7, 6, 5, 4, 3, 2, 1], bestEntryPerClub: false, minimumOnePoint: true, runOffTopPlaces: 0 });
    const after = JSON.stringify({ scoringScheme: 'FIXED_TABLE', pointsTable: [5, 4, 3, 2, 1, 0], bestEntryPerClub: false, minimumOnePoint: false, runOffTopPlaces: 0 });
    expect(describeMeetChange(before, after, meet)).toEqual({
      was: ['Places earn points from a fixed table: 1st 7, 2nd 6, 3rd 5, 4th 4, 5th 3, 6th 2, 7th 1. Lower places earn nothing.', 'Every club that enters an event earns at least 1 point in it.'],
      now: ['Places earn points from a fixed table: 1st 5, 2nd 4, 3rd 3, 4th 2, 5th 1, 6th 0. Lower places earn nothing.'],
    });
  });

  it('says nothing it cannot read', () => {
    expect(describeMeetChange('oops', '{}', meet)).toEqual({ was: [], now: [] });
  });
});
