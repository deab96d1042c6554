import type { Result } from '../api/types.js';

export interface ProgressionSeries {
  key: string;
  label: string;
  kind: Result['resultKind'];
  /** One point per placed result, oldest first: the meet's date and the time in seconds (or the score). */
  points: { date: Date; value: number; meetName: string }[];
}

/**
 * An athlete's progression per event and block diameter (a different block is a different
 * race, so it is its own line). Only placed results count: a DQ or scratch has no mark to draw.
 */
export function progression(results: readonly Result[], diameterText: (mm: number) => string): ProgressionSeries[] {
  const series = new Map<string, ProgressionSeries>();
  for (const r of results) {
    if (r.place === null) continue;
    const value = r.resultKind === 'TIMED' ? (r.totalHundredths ?? 0) / 100 : r.score;
    if (value === null) continue;
    const key = `${r.eventTypeId}|${r.diameterMm ?? ''}`;
    const line = series.get(key) ?? { key, label: r.diameterMm === null ? r.eventName : `${r.eventName}, ${diameterText(r.diameterMm)}`, kind: r.resultKind, points: [] };
    line.points.push({ date: new Date(`${r.meetDate}T12:00:00Z`), value, meetName: r.meetName });
    series.set(key, line);
  }
  for (const line of series.values()) line.points.sort((a, b) => a.date.getTime() - b.date.getTime());
  return [...series.values()];
}
