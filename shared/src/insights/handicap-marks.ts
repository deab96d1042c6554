import { median } from '../stats/index.js';
import { DEFAULT_DIAMETER_EXPONENT, normaliseTime } from './normalise-time.js';

export interface HandicapHistoryEntry {
  hundredths: number;
  diameterMm: number;
  /** ISO date (yyyy-mm-dd), newest counts first. */
  date: string;
}

export interface HandicapAthlete {
  athleteId: string;
  history: readonly HandicapHistoryEntry[];
}

export interface HandicapOptions {
  /** Diameter of the handicap event's blocks (all the same size). */
  blockDiameterMm: number;
  exponent?: number;
  /** How many of the newest times set the expectation. */
  lastK?: number;
  /** Fewer times than this and the mark is flagged for the organiser's judgement. */
  minHistory?: number;
  /** Marks are rounded to this many seconds. */
  stepSeconds?: number;
}

export type HandicapFlag = 'thin-history' | 'no-history';

export interface HandicapMark {
  athleteId: string;
  /** Median of the newest times, each rescaled to the event's block, in hundredths. */
  expectedHundredths: number | null;
  used: (HandicapHistoryEntry & { onBlockHundredths: number })[];
  n: number;
  /** Seconds after "go" that this athlete starts; null when there is no history. */
  markSeconds: number | null;
  flags: HandicapFlag[];
}

export const HANDICAP_CONVENTION =
  'Mark = expected time of the slowest athlete − own expected time, in seconds. The slowest starts at "go" with mark 0; ' +
  'everyone else starts that many seconds later, so the backmarker (the fastest) starts last and all finish together in expectation.';

export const HANDICAP_NOTE =
  "Suggested marks from recent times. The organiser sets the final marks under the sanctioning body's rules.";

/** Suggested handicap start marks with the working behind each one. */
export function handicapMarks(
  athletes: readonly HandicapAthlete[],
  options: HandicapOptions,
): { convention: string; note: string; slowestAthleteId: string | null; marks: HandicapMark[] } {
  const { blockDiameterMm, exponent = DEFAULT_DIAMETER_EXPONENT, lastK = 5, minHistory = 3, stepSeconds = 1 } = options;
  const expected = athletes.map((athlete) => {
    const used = [...athlete.history]
      .sort((a, b) => (a.date === b.date ? a.hundredths - b.hundredths : a.date < b.date ? 1 : -1))
      .slice(0, lastK)
      .map((entry) => ({
        ...entry,
        onBlockHundredths: normaliseTime(entry.hundredths, entry.diameterMm, { referenceMm: blockDiameterMm, exponent }),
      }));
    const flags: HandicapFlag[] = used.length === 0 ? ['no-history'] : used.length < minHistory ? ['thin-history'] : [];
    const expectedHundredths = used.length === 0 ? null : median(used.map((u) => u.onBlockHundredths));
    return { athleteId: athlete.athleteId, expectedHundredths, used, n: used.length, flags };
  });
  const timed = expected.filter((e) => e.expectedHundredths !== null);
  const slowest = timed.reduce<(typeof timed)[number] | null>(
    (worst, e) => (worst === null || e.expectedHundredths! > worst.expectedHundredths! ? e : worst),
    null,
  );
  const marks = expected.map((e) => ({
    ...e,
    markSeconds:
      e.expectedHundredths === null || slowest === null
        ? null
        : Math.round((slowest.expectedHundredths! - e.expectedHundredths) / 100 / stepSeconds) * stepSeconds,
  }));
  return { convention: HANDICAP_CONVENTION, note: HANDICAP_NOTE, slowestAthleteId: slowest?.athleteId ?? null, marks };
}
