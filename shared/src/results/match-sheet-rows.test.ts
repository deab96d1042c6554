import { describe, expect, it } from '@jest/globals';

import { matchSheetRows, type MeetSheetContext } from './match-sheet-rows.js';
import type { SheetRow } from './sheet-row.js';

// An invented meet: one timed event in two divisions, one scored and one fewest-hits event.
const context: MeetSheetContext = {
  events: [
    { id: 'uh-m', code: 'underhand-chop', name: 'Underhand chop', division: 'MENS', kind: 'TIMED', speciesId: 'eastern-white-pine', diameterMm: 304.8 },
    { id: 'uh-w', code: 'underhand-chop', name: 'Underhand chop', division: 'WOMENS', kind: 'TIMED', speciesId: 'eastern-white-pine', diameterMm: 254 },
    { id: 'throw', code: 'axe-throw', name: 'Axe throw', division: 'MIXED', kind: 'SCORED', speciesId: null, diameterMm: null },
    { id: 'hits', code: 'horizontal-hit', name: 'Horizontal hits', division: 'MENS', kind: 'FEWEST_HITS', speciesId: 'quaking-aspen', diameterMm: 203 },
  ],
  clubs: [
    { id: 'c1', name: 'Hollow Pine Woodsmen', shortName: 'HPINE' },
    { id: 'c2', name: 'Tamarack Ridge Axe Club', shortName: 'TRIDGE' },
  ],
  entries: [
    { id: 'e1', meetEventId: 'uh-m', clubId: 'c1', athleteNames: ['Ansel Birchfield'] },
    { id: 'e2', meetEventId: 'uh-w', clubId: 'c2', athleteNames: ['Orla Pinecrest'] },
    { id: 'e3', meetEventId: 'throw', clubId: 'c1', athleteNames: ['Ansel Birchfield'] },
    { id: 'e4', meetEventId: 'hits', clubId: 'c2', athleteNames: ['Tam Quillan'] },
  ],
};

let n = 1;
const row = (over: Partial<SheetRow>): SheetRow => ({
  row: ++n, event: 'Underhand chop', division: 'MENS', club: 'HPINE', athletes: ['Ansel Birchfield'], rawTimes: [4000], score: null,
  penaltySeconds: 0, status: 'FINISHED', reason: null, axeLabel: null, grind: null, bevelIncludedDeg: null, chiselWidthMm: null,
  speciesId: null, diameterMm: null, condition: null, ...over,
});

describe('matchSheetRows', () => {
  it('finds the entry by event name or code, club name or short name, names in any case', () => {
    const matched = matchSheetRows([
      row({ event: 'underhand-chop', club: 'hollow pine woodsmen', athletes: ['ansel  birchfield'] }),
      row({ event: 'UNDERHAND CHOP', division: 'WOMENS', club: 'TRIDGE', athletes: ['Orla Pinecrest'] }),
    ], context);
    expect(matched.ok && matched.rows.map((r) => [r.entryId, r.meetEventId, r.clubId])).toEqual([['e1', 'uh-m', 'c1'], ['e2', 'uh-w', 'c2']]);
  });

  it("takes the block from the meet event unless the sheet names one", () => {
    const matched = matchSheetRows([row({}), row({ division: 'WOMENS', club: 'TRIDGE', athletes: ['Orla Pinecrest'], speciesId: 'red-alder', diameterMm: 280 })], context);
    expect(matched.ok && matched.rows.map((r) => [r.speciesId, r.diameterMm])).toEqual([['eastern-white-pine', 304.8], ['red-alder', 280]]);
  });

  it('says which of event, division, club or athletes did not match', () => {
    n = 1;
    const matched = matchSheetRows([
      row({ event: 'Springbord' }),
      row({ division: 'MIXED' }),
      row({ club: 'Nowhere Axemen' }),
      row({ athletes: ['Someone Else'] }),
    ], context);
    expect(matched).toEqual({
      ok: false,
      errors: [
        { row: 2, column: 'event', message: 'row 2, event: "Springbord" is not an event of this meet' },
        { row: 3, column: 'division', message: 'row 3, division: this meet has no Underhand chop in the Mixed division' },
        { row: 4, column: 'club', message: 'row 4, club: "Nowhere Axemen" is not a club in the league' },
        { row: 5, column: 'athletes', message: `row 5, athletes: Hollow Pine Woodsmen has no entry of "Someone Else" in Underhand chop (Men's)` },
      ],
    });
  });

  it('refuses the same entry on two rows', () => {
    n = 1;
    const matched = matchSheetRows([row({}), row({ rawTimes: [3900] })], context);
    expect(matched).toEqual({ ok: false, errors: [{ row: 3, column: 'athletes', message: 'row 3, athletes: the same entry as row 2; give each entry one row' }] });
  });

  it('checks each row against its event kind', () => {
    n = 1;
    const matched = matchSheetRows([
      row({ rawTimes: [], score: 12 }),
      row({ event: 'Axe throw', division: 'MIXED', rawTimes: [] }),
      row({ event: 'Horizontal hits', club: 'TRIDGE', athletes: ['Tam Quillan'], score: 2.5 }),
    ], context);
    expect(matched.ok ? [] : matched.errors.map((e) => e.message)).toEqual([
      'row 2, score: Underhand chop is timed; leave the score empty',
      'row 2, time: a finished Underhand chop result needs a time',
      'row 3, score: a finished Axe throw result needs a score',
      'row 4, score: 2.5 hits is not a whole number',
    ]);
  });

  it('lets a scored event carry a time for its tie-break and a scratch carry none', () => {
    const matched = matchSheetRows([
      row({ event: 'Axe throw', division: 'MIXED', score: 17, rawTimes: [2100] }),
      row({ status: 'SCRATCH', rawTimes: [] }),
    ], context);
    expect(matched.ok).toBe(true);
    const scratchWithTime = matchSheetRows([row({ status: 'SCRATCH' })], context);
    expect(scratchWithTime.ok ? [] : scratchWithTime.errors.map((e) => e.column)).toEqual(['time']);
  });
});
