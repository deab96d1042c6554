import type { KeennessValue, StoredSwing, TrialConditionValue } from './entities/trial-values.js';

export interface SeedRun {
  axe: string;
  /** Index into the trial's testers. */
  tester: number;
  /** The mean the counted swings are spread around, mm. */
  meanMm: number;
  release: 1 | 2 | 3 | 4 | 5;
  keenness: KeennessValue;
  feel: string;
}

export interface SeedTrial {
  testedOn: string;
  speciesId: string;
  condition: TrialConditionValue;
  diameterMm: number;
  knots: string;
  faceUsed: string;
  airTempC: number | null;
  reference: string;
  /** Roster positions (by surname, then first name) of the testers. */
  testers: number[];
  notes: string;
  /** Published trials are the ones the Grain Map reads; an unpublished one stays with the club. */
  published: boolean;
  runs: SeedRun[];
}

// Spread of the counted swings around their mean: sums to zero, so the mean stays the stated one
// before the half-millimetre rounding a tape reading has.
const SPREAD = [-0.06, 0.03, 0.05, -0.02, 0];

/** One opening stroke, then five counted swings, shifted per run so no two runs read alike. */
export function seedSwings(meanMm: number, shift: number): StoredSwing[] {
  const half = (mm: number) => Math.round(mm * 2) / 2;
  const counted = SPREAD.map((_, i) => half(meanMm * (1 + SPREAD[(i + shift) % SPREAD.length]!)));
  return [{ depthMm: half(meanMm * 0.55), opening: true }, ...counted.map((depthMm) => ({ depthMm, opening: false }))];
}

const run = (axe: string, tester: number, meanMm: number, release: SeedRun['release'], keenness: KeennessValue, feel = ''): SeedRun => ({
  axe, tester, meanMm, release, keenness, feel,
});

// Invented trials for the two demo clubs with racks, keyed by club short name. Dated after the last
// setup change of every axe they use, so each run's head snapshot is the axe's setup that day.
export const DEMO_TRIALS: Record<string, SeedTrial[]> = {
  LARCH: [
    {
      testedOn: '2026-09-26', speciesId: 'quaking-aspen', condition: 'GREEN', diameterMm: 305, knots: '', faceUsed: 'north face, top half', airTempC: 14,
      reference: 'Practice 4', testers: [0, 1], notes: 'Season opener on fresh aspen from the sugar bush landing.', published: true,
      runs: [
        run('Practice 4', 0, 30, 3, 'WORKING', 'steady, forgiving'),
        run('Race 1', 0, 41, 4, 'KEEN', 'bites deep and lets go'),
        run('Race 2', 1, 38, 4, 'KEEN'),
        run('Old Blue', 0, 33, 2, 'WORKING', 'drags on the way out'),
      ],
    },
    {
      testedOn: '2026-10-03', speciesId: 'eastern-white-pine', condition: 'SEASONED', diameterMm: 305, knots: 'one pin knot low on the back', faceUsed: 'front face', airTempC: 11,
      reference: 'Practice 4', testers: [1, 2], notes: '', published: true,
      runs: [
        run('Practice 4', 0, 27, 3, 'WORKING'),
        run('Race 1', 0, 36, 5, 'KEEN', 'springs out clean'),
        run('Race 2', 0, 33, 4, 'KEEN'),
        run('Race 2', 1, 31, 4, 'KEEN', 'shorter swing than Race 1 needs'),
      ],
    },
    {
      testedOn: '2026-10-10', speciesId: 'eastern-cottonwood', condition: 'GREEN', diameterMm: 330, knots: '', faceUsed: 'side with the fewest checks', airTempC: 9,
      reference: 'Practice 4', testers: [0, 2], notes: 'Very wet block; the convex head grabbed.', published: true,
      runs: [
        run('Practice 4', 0, 31, 4, 'WORKING'),
        run('Race 1', 0, 39, 3, 'KEEN'),
        run('Race 2', 1, 40, 2, 'KEEN', 'deep but has to be rocked out'),
      ],
    },
    {
      testedOn: '2026-10-24', speciesId: 'yellow-poplar', condition: 'DRY', diameterMm: 280, knots: '', faceUsed: 'front face', airTempC: 12,
      reference: 'Practice 4', testers: [1], notes: '', published: true,
      runs: [run('Practice 4', 0, 23, 4, 'WORKING'), run('Race 1', 0, 29, 3, 'KEEN'), run('Old Blue', 0, 26, 3, 'WORKING')],
    },
    {
      testedOn: '2026-11-07', speciesId: 'quaking-aspen', condition: 'GREEN', diameterMm: 355, knots: 'two small knots on the left', faceUsed: 'right of the knots', airTempC: 6,
      reference: 'Practice 4', testers: [0, 3], notes: '', published: true,
      runs: [run('Practice 4', 0, 31, 3, 'WORKING'), run('Race 1', 0, 43, 4, 'KEEN'), run('Race 2', 1, 37, 5, 'KEEN', 'pops out on its own')],
    },
    {
      testedOn: '2026-11-14', speciesId: 'american-basswood', condition: 'PUNKY', diameterMm: 305, knots: '', faceUsed: 'the soundest face', airTempC: 4,
      reference: 'Practice 4', testers: [2], notes: 'Soft heart; both racing heads buried themselves.', published: true,
      runs: [run('Practice 4', 0, 38, 3, 'WORKING'), run('Race 1', 0, 46, 2, 'KEEN'), run('Race 2', 0, 44, 1, 'WORKING', 'stuck fast twice')],
    },
    {
      testedOn: '2026-11-28', speciesId: 'eastern-white-pine', condition: 'SEASONED', diameterMm: 305, knots: '', faceUsed: 'front face', airTempC: 3,
      reference: 'Practice 4', testers: [0, 1], notes: 'Repeat of the October pine test.', published: false,
      runs: [run('Practice 4', 0, 27, 3, 'WORKING'), run('Race 1', 0, 37, 5, 'KEEN'), run('Race 2', 1, 34, 4, 'WORKING')],
    },
  ],
  CFORK: [
    {
      testedOn: '2026-10-09', speciesId: 'eastern-white-pine', condition: 'SEASONED', diameterMm: 305, knots: '', faceUsed: 'front face', airTempC: 10,
      reference: 'CF Trainer', testers: [0, 1], notes: '', published: true,
      runs: [run('CF Trainer', 0, 28, 3, 'WORKING'), run('CF Springboard', 0, 37, 4, 'KEEN'), run('CF Spare', 1, 32, 4, 'WORKING')],
    },
    {
      testedOn: '2026-10-17', speciesId: 'quaking-aspen', condition: 'GREEN', diameterMm: 305, knots: '', faceUsed: 'east face', airTempC: 8,
      reference: 'CF Trainer', testers: [1, 2], notes: '', published: true,
      runs: [
        run('CF Trainer', 0, 31, 3, 'WORKING'),
        run('CF Springboard', 0, 42, 3, 'KEEN'),
        run('CF Springboard', 1, 45, 3, 'KEEN', 'heavier swing, deeper cut'),
        run('CF Spare', 0, 36, 4, 'WORKING'),
      ],
    },
    {
      testedOn: '2026-10-31', speciesId: 'quaking-aspen', condition: 'GREEN', diameterMm: 330, knots: 'knot near the top', faceUsed: 'below the knot', airTempC: 5,
      reference: 'CF Trainer', testers: [0], notes: '', published: true,
      runs: [run('CF Trainer', 0, 30, 4, 'WORKING'), run('CF Springboard', 0, 40, 2, 'KEEN', 'drags in the wet'), run('CF Spare', 0, 35, 4, 'WORKING')],
    },
    {
      testedOn: '2026-11-01', speciesId: 'red-alder', condition: 'FROZEN', diameterMm: 280, knots: '', faceUsed: 'south face', airTempC: -3,
      reference: 'CF Trainer', testers: [2], notes: 'Practice and spare heads only; the racing edge stayed sheathed.', published: true,
      runs: [run('CF Trainer', 0, 22, 3, 'WORKING'), run('CF Spare', 0, 24, 3, 'WORKING', 'chips fly rather than lift')],
    },
    {
      testedOn: '2026-11-21', speciesId: 'eastern-white-pine', condition: 'SEASONED', diameterMm: 355, knots: '', faceUsed: 'front face', airTempC: 2,
      reference: 'CF Trainer', testers: [0, 1], notes: 'The spare is out until its handle is replaced.', published: false,
      runs: [run('CF Trainer', 0, 29, 3, 'WORKING'), run('CF Springboard', 1, 38, 5, 'KEEN')],
    },
  ],
};
