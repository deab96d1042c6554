// Invented league data for the meets feature's component tests.
import type { ClubOption, EventType, MeetDetail, MeetEvent, Season } from '../api/types.js';

export const testSeason: Season = { __typename: 'Season', id: 'season-1', name: '2026–27', startsOn: '2026-09-01', endsOn: '2027-05-31', isCurrent: true };

export const testClubs: ClubOption[] = [
  { __typename: 'Club', id: 'club-hollow', name: 'Hollow Pine Woodsmen', shortName: 'HPINE' },
  { __typename: 'Club', id: 'club-tamarack', name: 'Tamarack Ridge Axe Club', shortName: 'TRIDGE' },
];

export const testEventType: EventType = {
  __typename: 'EventType',
  id: 'type-underhand',
  code: 'underhand-chop',
  name: 'Underhand chop',
  resultKind: 'TIMED',
  teamSize: 1,
  mixedPair: false,
  usesHead: true,
  description: 'Standing on the log, the athlete chops through it between their feet.',
  defaultDiameters: [{ __typename: 'DivisionDiameter', division: 'MENS', diameterMm: 305 }],
};

export function testMeetEvent(overrides: Partial<MeetEvent> = {}): MeetEvent {
  return {
    __typename: 'MeetEvent',
    id: 'event-1',
    meetId: 'meet-1',
    position: 1,
    eventType: testEventType,
    division: 'MENS',
    speciesId: 'eastern-white-pine',
    speciesName: 'Eastern white pine',
    diameterMm: 305,
    timeLimitHundredths: null,
    weight: 1,
    notes: '',
    scoringScheme: null,
    pointsTable: null,
    heatSize: null,
    drawSeed: null,
    entries: [],
    ...overrides,
  };
}

export function testMeet(overrides: Partial<MeetDetail> = {}): MeetDetail {
  return {
    __typename: 'MeetDetail',
    id: 'meet-1',
    name: 'Hollow Pine Thaw Chop',
    seasonId: testSeason.id,
    seasonName: testSeason.name,
    hostClubId: 'club-hollow',
    hostClubName: 'Hollow Pine Woodsmen',
    startsOn: '2027-03-13',
    venue: 'Hollow Pine woodlot',
    entryDeadline: '2027-03-10T12:00:00.000Z', // midday UTC: the same day from UTC−12 to UTC+11,
    divisions: ['MENS', 'WOMENS'],
    status: 'OPEN',
    entriesOpen: true,
    eventCount: 1,
    entryCount: 0,
    scoringScheme: 'FIXED_TABLE',
    pointsTable: [7, 6, 5, 4, 3, 2, 1],
    bestEntryPerClub: false,
    minimumOnePoint: true,
    runOffTopPlaces: 0,
    maxEventsPerAthlete: null,
    requireMixedPairs: true,
    canManage: false,
    enterableClubIds: ['club-hollow'],
    isTimekeeper: false,
    events: [testMeetEvent()],
    ...overrides,
  };
}
