import type { HeadSnapshot } from '../trials/index.js';

/** A finished, timed result with the head and wood it was cut with (official time, penalties in). */
export interface RaceResult {
  resultId: string;
  athleteId: string;
  eventType: string;
  speciesId: string;
  condition: string | null;
  diameterMm: number;
  hundredths: number;
  /** Snapshot of the head at the time; null when no axe was linked (such results are skipped). */
  head: HeadSnapshot | null;
}

/** Median with its percentile-bootstrap interval. */
export interface MedianWithInterval {
  median: number;
  low: number;
  high: number;
}
