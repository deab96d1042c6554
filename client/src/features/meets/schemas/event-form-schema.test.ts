import { describe, expect, it } from '@jest/globals';

import type { MeetEvent } from '../api/types.js';
import { diameterInMm, eventFormDefaults, eventFormSchema, toMeetEventInput, type EventFormValues } from './event-form-schema.js';

const filled: EventFormValues = {
  ...eventFormDefaults(undefined, 'METRIC'),
  eventTypeId: 'type-underhand',
  division: 'MENS',
  speciesId: 'eastern-white-pine',
  diameter: '12',
  diameterUnit: 'in',
  timeLimit: '1:30',
};

function issues(values: EventFormValues) {
  const result = eventFormSchema.safeParse(values);
  return result.success ? {} : Object.fromEntries(result.error.issues.map((issue) => [issue.path.join('.'), issue.message]));
}

describe('eventFormSchema', () => {
  it('sends a diameter typed in inches as exact millimetres and the limit as hundredths', () => {
    expect(issues(filled)).toEqual({});
    // exact: 12 in = 304.8 mm (NIST SP 811, App. B.8); hand-worked: 1:30 = 90 s = 9000 hundredths
    expect(toMeetEventInput(filled)).toEqual({
      eventTypeId: 'type-underhand',
      division: 'MENS',
      speciesId: 'eastern-white-pine',
      diameterMm: 304.8,
      timeLimitHundredths: 9000,
      weight: 1,
      scoringScheme: null,
      pointsTable: null,
      notes: '',
    });
  });

  it("gives an event its own points table, checked like the meet's, or leaves it to the meet", () => {
    const own = { ...filled, scoring: 'FIXED_TABLE' as const, pointsTable: '10-8-6-4-2' };
    expect(issues(own)).toEqual({});
    expect(toMeetEventInput(own)).toMatchObject({ scoringScheme: 'FIXED_TABLE', pointsTable: [10, 8, 6, 4, 2] });
    expect(issues({ ...own, pointsTable: '4, 6' })).toEqual({ pointsTable: 'Place 2 cannot earn more points than place 1.' });
    // A table typed before switching back to the meet's scoring is not sent.
    expect(toMeetEventInput({ ...own, scoring: 'MEET' })).toMatchObject({ scoringScheme: null, pointsTable: null });
    expect(toMeetEventInput({ ...own, scoring: 'FIELD_SIZE' })).toMatchObject({ scoringScheme: 'FIELD_SIZE', pointsTable: null });
  });

  it('leaves a blank diameter to the event type default and a blank species unset', () => {
    const input = toMeetEventInput({ ...filled, diameter: '', speciesId: '', timeLimit: '' });
    expect(input.diameterMm).toBeNull();
    expect(input.speciesId).toBeNull();
    expect(input.timeLimitHundredths).toBeNull();
  });

  it('refuses a block too small to cut, checked in millimetres whatever unit was typed', () => {
    // hand-worked: 1.5 in = 38.1 mm, under the server's 50 mm floor; 1.5 mm likewise
    const message = 'Block diameter must be between 50 mm (2 in) and 1500 mm (59 in).';
    expect(issues({ ...filled, diameter: '1.5', diameterUnit: 'in' })).toEqual({ diameter: message });
    expect(issues({ ...filled, diameter: '1.5', diameterUnit: 'mm' })).toEqual({ diameter: message });
    expect(issues({ ...filled, diameter: 'twelve' })).toEqual({ diameter: message });
  });

  it('explains a time limit that is not m:ss.hh', () => {
    expect(issues({ ...filled, timeLimit: '1:5.3' })).toEqual({
      timeLimit: '"1:5.3" is not m:ss.hh. Write it like 1:30.00 or 90.',
    });
  });

  it('requires an event type, a division and a sensible weight', () => {
    expect(Object.keys(issues({ ...filled, eventTypeId: '', division: '', weight: '0' })).sort()).toEqual([
      'division',
      'eventTypeId',
      'weight',
    ]);
  });

  it('reads a decimal comma in the weight and the diameter', () => {
    // hand-worked: "1,5" means 1.5 on many keyboards
    expect(toMeetEventInput({ ...filled, weight: '1,5' }).weight).toBe(1.5);
    expect(diameterInMm('254,0', 'mm')).toBe(254);
  });

  it('starts an edit in the reader units', () => {
    const event = { diameterMm: 254, timeLimitHundredths: 4550, weight: 1.5, notes: '', speciesId: null, division: 'WOMENS', eventType: { id: 't1' } } as unknown as MeetEvent;
    // exact: 254 mm = 10 in; formatTime prints 4550 hundredths as "45.50"
    expect(eventFormDefaults(event, 'IMPERIAL')).toMatchObject({ diameter: '10', diameterUnit: 'in', timeLimit: '45.50', weight: '1.5' });
    expect(eventFormDefaults(event, 'METRIC')).toMatchObject({ diameter: '254', diameterUnit: 'mm' });
  });
});
