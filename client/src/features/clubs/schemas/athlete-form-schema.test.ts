import { describe, expect, it } from '@jest/globals';

import { athleteFormDefaults, athleteFormSchema, toAthleteInput, type AthleteFormValues } from './athlete-form-schema.js';

const filled: AthleteFormValues = { ...athleteFormDefaults(), firstName: ' Wren ', lastName: 'Ashgrove', divisions: ['WOMENS', 'MIXED'] };

function issues(values: AthleteFormValues) {
  const result = athleteFormSchema.safeParse(values);
  return result.success ? {} : Object.fromEntries(result.error.issues.map((issue) => [issue.path.join('.'), issue.message]));
}

describe('athleteFormSchema', () => {
  it('accepts a rookie typed in by a coach, without an account or a first season', () => {
    expect(issues(filled)).toEqual({});
    expect(toAthleteInput('club-1', filled)).toEqual({
      clubId: 'club-1',
      firstName: 'Wren',
      lastName: 'Ashgrove',
      divisions: ['WOMENS', 'MIXED'],
      experience: 'ROOKIE',
      firstSeasonYear: null,
    });
  });

  it('asks for both names and a division, in the server wording', () => {
    expect(issues({ ...filled, firstName: '  ', lastName: '', divisions: [] })).toEqual({
      firstName: 'First name is required.',
      lastName: 'Last name is required.',
      divisions: 'Pick at least one division.',
    });
  });

  it('takes a first season as a four-digit year from 1950 to 2100', () => {
    // bounds from the server's check (server/src/league/clubs.service.ts)
    expect(issues({ ...filled, firstSeasonYear: '2025' })).toEqual({});
    expect(toAthleteInput('c', { ...filled, firstSeasonYear: '2025' }).firstSeasonYear).toBe(2025);
    expect(issues({ ...filled, firstSeasonYear: '25' })).toEqual({ firstSeasonYear: 'First season must be a year such as 2025.' });
    expect(issues({ ...filled, firstSeasonYear: '1949' })).toHaveProperty('firstSeasonYear');
  });
});
