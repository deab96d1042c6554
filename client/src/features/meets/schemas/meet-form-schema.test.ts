import { describe, expect, it } from '@jest/globals';

import { meetFormDefaults, meetFormSchema, toMeetInput, type MeetFormValues } from './meet-form-schema.js';

const filled: MeetFormValues = {
  ...meetFormDefaults(undefined, 'season-1'),
  name: 'Hollow Pine Thaw Chop',
  hostClubId: 'club-1',
  startsOn: '2027-03-13',
  venue: 'Hollow Pine woodlot',
  entryDeadline: '2027-03-10T18:00',
};

function issues(values: MeetFormValues) {
  const result = meetFormSchema.safeParse(values);
  return result.success ? {} : Object.fromEntries(result.error.issues.map((issue) => [issue.path.join('.'), issue.message]));
}

describe('meetFormSchema', () => {
  it('accepts a complete meet with the default 7-6-5-4-3-2-1 table', () => {
    expect(issues(filled)).toEqual({});
    // the preset table, first place first (in use at collegiate meets)
    expect(toMeetInput(filled).pointsTable).toEqual([7, 6, 5, 4, 3, 2, 1]);
  });

  it('refuses entries that close after the meet day, with the server wording', () => {
    expect(issues({ ...filled, entryDeadline: '2027-03-14T09:00' })).toEqual({
      entryDeadline: 'Entries must close on or before the meet day.',
    });
  });

  it('checks a custom table and sends it as numbers', () => {
    expect(issues({ ...filled, tablePreset: 'custom', pointsTable: '10, 8, 9' })).toEqual({
      pointsTable: 'Place 3 cannot earn more points than place 2.',
    });
    expect(toMeetInput({ ...filled, tablePreset: 'custom', pointsTable: '10, 8, 6, 4' }).pointsTable).toEqual([10, 8, 6, 4]);
  });

  it('sends no table for field-size scoring and no limit when the limit is blank', () => {
    const input = toMeetInput({ ...filled, scoringScheme: 'FIELD_SIZE', tablePreset: 'custom', pointsTable: 'junk' });
    expect(input.pointsTable).toBeNull();
    expect(input.maxEventsPerAthlete).toBeNull();
    expect(input.runOffTopPlaces).toBe(0);
  });

  it('names every missing field', () => {
    const blank = meetFormDefaults(undefined);
    expect(Object.keys(issues({ ...blank, divisions: [] })).sort()).toEqual(
      ['divisions', 'entryDeadline', 'hostClubId', 'name', 'seasonId', 'startsOn', 'venue'].sort(),
    );
  });

  it('refuses an event limit of zero or a fraction', () => {
    expect(issues({ ...filled, maxEventsPerAthlete: '0' })).toEqual({
      maxEventsPerAthlete: 'Events per athlete must be a whole number from 1 to 30.',
    });
    expect(issues({ ...filled, maxEventsPerAthlete: '2.5' })).toHaveProperty('maxEventsPerAthlete');
  });

  it('starts an edit from the stored meet, recognising a preset table', () => {
    const values = meetFormDefaults({
      id: 'm1', name: 'Old Mill Split', seasonId: 's1', seasonName: '2026–27', hostClubId: 'c1', hostClubName: 'Hollow Pine',
      startsOn: '2026-11-07', venue: 'Old mill yard', entryDeadline: '2026-11-04T20:00:00Z', divisions: ['MENS'],
      status: 'DRAFT', entriesOpen: false, eventCount: 0, entryCount: 0, scoringScheme: 'FIXED_TABLE',
      pointsTable: [5, 4, 3, 2, 1, 0], bestEntryPerClub: true, minimumOnePoint: false, runOffTopPlaces: 3,
      maxEventsPerAthlete: 4, requireMixedPairs: false,
    });
    expect(values.tablePreset).toBe('5-4-3-2-1-0');
    expect(values.runOffTopPlaces).toBe('3');
    expect(values.maxEventsPerAthlete).toBe('4');
  });
});
