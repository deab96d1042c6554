import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { officialTime } from './official-time.js';

describe('officialTime', () => {
  it('takes a single watch as it is', () => {
    expect(officialTime([4523])).toEqual({ official: 4523, used: [4523], dropped: null });
  });

  it('averages two watches', () => {
    // fixed-table meet rules: "two stopwatch times averaged"; hand-worked (4520 + 4530) / 2 = 4525
    expect(officialTime([4520, 4530])).toEqual({ official: 4525, used: [4520, 4530], dropped: null });
  });

  it('rounds a half-hundredth mean up', () => {
    // hand-worked: (4520 + 4523) / 2 = 4521.5 → 4522 (half up)
    expect(officialTime([4520, 4523]).official).toBe(4522);
  });

  it('drops the watch furthest from the other two of three', () => {
    // a state rules document: "the time furthest from the other two is discarded"
    // hand-worked: 45.20, 45.24, 45.90 → median 45.24; 45.90 is 0.66 away, 45.20 only 0.04;
    // drop 45.90, (4520 + 4524) / 2 = 4522
    expect(officialTime([4590, 4520, 4524])).toEqual({ official: 4522, used: [4520, 4524], dropped: 4590 });
  });

  it('drops a fast outlier just as a slow one', () => {
    // hand-worked: 44.10, 45.20, 45.30 → median 45.20; 44.10 is 1.10 away, 45.30 is 0.10;
    // drop 44.10, (4520 + 4530) / 2 = 4525
    expect(officialTime([4520, 4410, 4530])).toEqual({ official: 4525, used: [4520, 4530], dropped: 4410 });
  });

  it('keeps the middle watch and drops the fastest when both ends are equally far', () => {
    // hand-worked: 45.10, 45.20, 45.30 → both ends 0.10 from the median; our rule drops the
    // fastest (doubt resolves to the slower reading): (4520 + 4530) / 2 = 4525
    expect(officialTime([4530, 4510, 4520])).toEqual({ official: 4525, used: [4530, 4520], dropped: 4510 });
  });

  it('drops the lone time when two watches agree', () => {
    // hand-worked: 45.20, 45.20, 45.50 → median 45.20; 45.50 is 0.30 away, the other 0 → drop it
    expect(officialTime([4520, 4550, 4520])).toEqual({ official: 4520, used: [4520, 4520], dropped: 4550 });
  });

  it('lies between the fastest and slowest used watch', () => {
    // property: an average of the used times can never leave their range
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 1_000_000 }), { minLength: 1, maxLength: 3 }), (raw) => {
        const { official, used } = officialTime(raw);
        expect(official).toBeGreaterThanOrEqual(Math.min(...used));
        expect(official).toBeLessThanOrEqual(Math.max(...used));
        expect(Number.isInteger(official)).toBe(true);
      }),
    );
  });

  it.each([[[]], [[1, 2, 3, 4]], [[45.2]], [[-1]]])('refuses %j', (raw) => {
    expect(() => officialTime(raw)).toThrow(RangeError);
  });
});
