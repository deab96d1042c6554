// Invented club data for the clubs feature's component tests.
import type { Athlete, ClubDetail } from '../api/types.js';

export function testAthlete(overrides: Partial<Athlete> = {}): Athlete {
  return {
    __typename: 'Athlete',
    id: 'ath-rowan',
    clubId: 'club-hollow',
    clubName: 'Hollow Pine Woodsmen',
    firstName: 'Rowan',
    lastName: 'Tamarack',
    name: 'Rowan Tamarack',
    divisions: ['MENS', 'MIXED'],
    experience: 'DEVELOPING',
    firstSeasonYear: 2024,
    hasAccount: false,
    ...overrides,
  };
}

export function testClub(overrides: Partial<ClubDetail> = {}): ClubDetail {
  return {
    __typename: 'ClubDetail',
    id: 'club-hollow',
    name: 'Hollow Pine Woodsmen',
    shortName: 'HPINE',
    region: 'Upper Hollow',
    contactEmail: null,
    colourPrimary: '#2f5d3a',
    colourSecondary: '#c9a66b',
    athleteCount: 1,
    canManage: false,
    roster: [testAthlete()],
    ...overrides,
  };
}
