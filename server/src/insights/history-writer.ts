import { randomUUID } from 'node:crypto';

import type { RaceResult } from '@endgrain/shared';
import type { EntityManager } from 'typeorm';

import { toDb } from './insights-rows.js';

export interface HistoryBatch {
  seasonId: string;
  hostClubId: string;
  eventTypeId: string;
  division: 'MENS' | 'WOMENS' | 'MIXED';
  /** Simulated athlete id → real athlete id and club. */
  athletes: ReadonlyMap<string, { athleteId: string; clubId: string }>;
  /** First meet date; each later meet of the batch is a week on. */
  firstDate: string;
  meetName: string;
  results: readonly RaceResult[];
}

/**
 * Writes past, published meets holding the given results: an athlete's k-th result goes to
 * the batch's k-th meet, so nobody is entered twice in one event. Places are by time;
 * points are left at 0 so invented history never moves a season's standings.
 */
export async function writeHistory(m: EntityManager, batch: HistoryBatch): Promise<number> {
  const byMeet: RaceResult[][] = [];
  const seen = new Map<string, number>();
  for (const result of batch.results) {
    const k = seen.get(result.athleteId) ?? 0;
    seen.set(result.athleteId, k + 1);
    (byMeet[k] ??= []).push(result);
  }
  for (const [k, results] of byMeet.entries()) {
    const meetId = randomUUID();
    const meetEventId = randomUUID();
    const date = addDays(batch.firstDate, 7 * k);
    await m.query(
      `INSERT INTO meets (id, season_id, host_club_id, name, starts_on, venue, entry_deadline, divisions, scoring_scheme, status)
       VALUES (?, ?, ?, ?, ?, 'Invented history ground', ?, ?, 'FIELD_SIZE', 'ARCHIVED')`,
      [meetId, batch.seasonId, batch.hostClubId, `${batch.meetName} ${k + 1}`, date, `${date} 00:00:00`, batch.division],
    );
    await m.query('INSERT INTO meet_events (id, meet_id, event_type_id, division, species_id, diameter_mm) VALUES (?, ?, ?, ?, ?, ?)', [
      meetEventId, meetId, batch.eventTypeId, batch.division, results[0]!.speciesId, results[0]!.diameterMm,
    ]);
    const ranked = [...results].sort((a, b) => a.hundredths - b.hundredths);
    for (const [place, result] of ranked.entries()) {
      const athlete = batch.athletes.get(result.athleteId);
      if (athlete === undefined) throw new Error(`no athlete mapped for ${result.athleteId}`);
      const entryId = randomUUID();
      await m.query('INSERT INTO entries (id, meet_event_id, club_id) VALUES (?, ?, ?)', [entryId, meetEventId, athlete.clubId]);
      await m.query('INSERT INTO entry_athletes (entry_id, athlete_id, meet_event_id) VALUES (?, ?, ?)', [entryId, athlete.athleteId, meetEventId]);
      await m.query(
        `INSERT INTO results (id, entry_id, meet_event_id, meet_id, season_id, club_id, event_type_id, division, meet_date, status, raw_times,
           time_hundredths, final_status, total_hundredths, place, points, counts_for_club, grind, bevel_included_deg, chisel_width_mm,
           species_id, diameter_mm, block_condition)
         VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, 'FINISHED', ?, ?, 'FINISHED', ?, ?, 0, 0, ?, ?, ?, ?, ?, ?)`,
        [
          randomUUID(), entryId, meetEventId, meetId, batch.seasonId, athlete.clubId, batch.eventTypeId, batch.division, date,
          JSON.stringify([result.hundredths]), result.hundredths, result.hundredths, place + 1,
          result.head === null ? null : toDb(result.head.grind), result.head?.includedDeg ?? null, result.head?.chiselWidthMm ?? null,
          result.speciesId, result.diameterMm, result.condition === null ? null : toDb(result.condition),
        ],
      );
    }
  }
  return batch.results.length;
}

function addDays(iso: string, days: number): string {
  const date = new Date(`${iso}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}
