/** The demo season's meets (invented venues). Event codes refer to the shared event catalogue. */
export interface DemoMeetEvent {
  code: string;
  division: 'MENS' | 'WOMENS' | 'MIXED';
  speciesId: string | null;
  diameterMm: number | null;
  weight?: number;
}

export interface DemoMeet {
  key: string;
  name: string;
  hostClubKey: string;
  startsOn: string;
  entryDeadline: string;
  venue: string;
  status: 'DRAFT' | 'OPEN' | 'CLOSED';
  scoringScheme: 'FIXED_TABLE' | 'FIELD_SIZE' | 'PERCENT_OF_BEST';
  pointsTable: number[] | null;
  bestEntryPerClub: boolean;
  minimumOnePoint: boolean;
  /** Whether the seed enters athletes from every club. */
  withEntries: boolean;
  events: DemoMeetEvent[];
}

const CORE: DemoMeetEvent[] = [
  { code: 'underhand-chop', division: 'MENS', speciesId: 'eastern-white-pine', diameterMm: 305 },
  { code: 'underhand-chop', division: 'WOMENS', speciesId: 'eastern-white-pine', diameterMm: 254 },
  { code: 'standing-block-chop', division: 'MENS', speciesId: 'quaking-aspen', diameterMm: 305 },
  { code: 'single-buck', division: 'WOMENS', speciesId: 'eastern-white-pine', diameterMm: 254 },
  { code: 'mixed-double-buck', division: 'MIXED', speciesId: 'eastern-white-pine', diameterMm: 305 },
  { code: 'axe-throw', division: 'MIXED', speciesId: null, diameterMm: null },
];

export const DEMO_MEETS: DemoMeet[] = [
  {
    key: 'autumn-split', name: 'Larchmere Autumn Split', hostClubKey: 'larchmere', startsOn: '2026-10-17',
    entryDeadline: '2026-10-14T20:00:00Z', venue: 'Larchmere College sugar bush', status: 'CLOSED',
    scoringScheme: 'FIXED_TABLE', pointsTable: [7, 6, 5, 4, 3, 2, 1], bestEntryPerClub: true, minimumOnePoint: true,
    withEntries: true, events: CORE,
  },
  {
    key: 'frost-chop', name: 'Cedar Fork Frost Chop', hostClubKey: 'cedar-fork', startsOn: '2026-12-12',
    entryDeadline: '2026-12-09T20:00:00Z', venue: 'Cedar Fork fairground pavilion', status: 'OPEN',
    scoringScheme: 'FIELD_SIZE', pointsTable: null, bestEntryPerClub: false, minimumOnePoint: false,
    withEntries: true,
    events: [...CORE, { code: 'springboard', division: 'MENS', speciesId: 'yellow-poplar', diameterMm: 280, weight: 1.5 }],
  },
  {
    key: 'spring-conclave', name: 'Alder Flats Spring Gathering', hostClubKey: 'alder-flats', startsOn: '2027-04-10',
    entryDeadline: '2027-04-03T20:00:00Z', venue: 'Alder Flats river meadow', status: 'DRAFT',
    scoringScheme: 'PERCENT_OF_BEST', pointsTable: null, bestEntryPerClub: false, minimumOnePoint: false,
    withEntries: false, events: CORE.slice(0, 3),
  },
];
