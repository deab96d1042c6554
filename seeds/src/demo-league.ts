/**
 * The invented demo league. Every person, club and place here is made up for the demo;
 * addresses use example.org.
 */
export interface DemoClub {
  key: string;
  name: string;
  shortName: string;
  region: string;
  contactEmail: string;
  colourPrimary: string;
  colourSecondary: string;
}

export const DEMO_SEASON = { name: '2026–27 season', startsOn: '2026-09-01', endsOn: '2027-05-31' };

export const DEMO_CLUBS: DemoClub[] = [
  { key: 'larchmere', name: 'Larchmere College Woodsmen', shortName: 'LARCH', region: 'Upper Tamsin Valley', contactEmail: 'woodsmen@larchmere.example.org', colourPrimary: '#1f4d3a', colourSecondary: '#e0b04a' },
  { key: 'cedar-fork', name: 'Cedar Fork Axe Club', shortName: 'CFORK', region: 'Cedar Fork Hills', contactEmail: 'axeclub@cedarfork.example.org', colourPrimary: '#7a2e1d', colourSecondary: '#f2e6c9' },
  { key: 'alder-flats', name: 'Alder Flats Timber Team', shortName: 'ALDER', region: 'Alder Flats Lowland', contactEmail: 'timber@alderflats.example.org', colourPrimary: '#2b3f6b', colourSecondary: '#c9d6df' },
  { key: 'birchwood', name: 'North Birchwood Sawyers', shortName: 'NBIRCH', region: 'Birchwood Plateau', contactEmail: 'sawyers@birchwood.example.org', colourPrimary: '#4a4a4a', colourSecondary: '#d96c2c' },
  { key: 'quarry-run', name: 'Quarry Run Forestry Club', shortName: 'QRUN', region: 'Quarry Run Basin', contactEmail: 'forestry@quarryrun.example.org', colourPrimary: '#51602b', colourSecondary: '#efe3b0' },
];

export type DemoDivision = 'MENS' | 'WOMENS' | 'MIXED';
export type DemoExperience = 'ROOKIE' | 'DEVELOPING' | 'EXPERIENCED';

export interface DemoAthlete {
  key: string;
  clubKey: string;
  firstName: string;
  lastName: string;
  divisions: DemoDivision[];
  experience: DemoExperience;
  firstSeasonYear: number;
}

const WOMEN = ['Maren', 'Tove', 'Ilsa', 'Brenna', 'Corra', 'Linnea', 'Wren', 'Odile', 'Petra', 'Saskia', 'Yara', 'Fenna', 'Greer', 'Hollis', 'Junia', 'Kestrel', 'Liesl', 'Marit', 'Nessa', 'Oona'];
const MEN = ['Anders', 'Bram', 'Cato', 'Dorian', 'Ewan', 'Fintan', 'Gideon', 'Hale', 'Ivo', 'Jory', 'Kasimir', 'Lorcan', 'Mattias', 'Nils', 'Osric', 'Pim', 'Quill', 'Rune', 'Soren', 'Tobiah'];
const SURNAMES = ['Ashgrove', 'Blackbourne', 'Copperfell', 'Dunmere', 'Elderby', 'Fallowmere', 'Greywater', 'Hartwell', 'Ironsett', 'Juniperholm', 'Kettleby', 'Longacre', 'Marrowdale', 'Northcote', 'Oakhurst', 'Pellworth', 'Quenby', 'Rookwood', 'Stillwater', 'Thistlecombe', 'Underhill', 'Vantwood', 'Whitlock', 'Yarrowby'];
const LEVELS: DemoExperience[] = ['ROOKIE', 'DEVELOPING', 'EXPERIENCED'];

/** Forty-odd athletes: eight or nine per club, women and men, all three levels. Deterministic. */
export function demoAthletes(): DemoAthlete[] {
  const athletes: DemoAthlete[] = [];
  DEMO_CLUBS.forEach((club, c) => {
    for (let i = 0; i < 9; i += 1) {
      const woman = i % 2 === 0;
      const pool = woman ? WOMEN : MEN;
      const firstName = pool[(c * 4 + Math.floor(i / 2)) % pool.length]!;
      const lastName = SURNAMES[(c * 5 + i * 3) % SURNAMES.length]!;
      const experience = LEVELS[(i + c) % 3]!;
      athletes.push({
        key: `${club.key}-${i + 1}`,
        clubKey: club.key,
        firstName,
        lastName,
        divisions: [woman ? 'WOMENS' : 'MENS', 'MIXED'],
        experience,
        firstSeasonYear: 2026 - ['ROOKIE', 'DEVELOPING', 'EXPERIENCED'].indexOf(experience) - (i % 2),
      });
    }
  });
  return athletes;
}

export interface DemoAccount {
  email: string;
  displayName: string;
  role: 'ADMIN' | 'ORGANISER' | 'COACH' | 'ATHLETE';
  /** Club membership for the club-scoped roles. */
  clubKey?: string;
  /** Roster entry the account is linked to (athletes). */
  athleteKey?: string;
}

export const DEMO_ACCOUNTS: DemoAccount[] = [
  { email: 'admin@example.org', displayName: 'League Admin (demo)', role: 'ADMIN' },
  { email: 'organiser@example.org', displayName: 'Meet Organiser (demo)', role: 'ORGANISER' },
  { email: 'coach@example.org', displayName: 'Club Coach (demo)', role: 'COACH', clubKey: 'larchmere' },
  { email: 'athlete@example.org', displayName: 'Maren Ashgrove (demo)', role: 'ATHLETE', clubKey: 'larchmere', athleteKey: 'larchmere-1' },
  { email: 'coach.cedarfork@example.org', displayName: 'Cedar Fork Coach (demo)', role: 'COACH', clubKey: 'cedar-fork' },
];
