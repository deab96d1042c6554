import { describe, expect, it } from '@jest/globals';

import { clubFormSchema, toClubInput } from './club-form-schema.js';

const good = { name: 'Hollow Pine Woodsmen', shortName: 'hpine', region: 'North Hollow', contactEmail: '', colourPrimary: '#2F5D3A', colourSecondary: '#c9a66b' };

describe('clubFormSchema', () => {
  it('accepts a club and writes it as the API expects', () => {
    expect(clubFormSchema.safeParse(good).success).toBe(true);
    expect(toClubInput(good)).toEqual({ ...good, shortName: 'HPINE', contactEmail: null, colourPrimary: '#2f5d3a' });
  });

  it('names the field and says what is wrong, in the server’s words', () => {
    const issues = (values: object) => clubFormSchema.safeParse({ ...good, ...values }).error?.issues.map((i) => [i.path.join('.'), i.message]);
    expect(issues({ shortName: 'H' })).toEqual([['shortName', 'Short name needs at least 2 characters.']]);
    expect(issues({ colourPrimary: 'green' })).toEqual([['colourPrimary', 'Colours are written #rrggbb, for example #2f5d3a.']]);
    expect(issues({ contactEmail: 'not-an-address' })).toEqual([['contactEmail', 'Enter a valid e-mail address.']]);
  });
});
