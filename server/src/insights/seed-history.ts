import { randomUUID } from 'node:crypto';

import { simulateRaceResults, type SimulationSpec } from '@endgrain/shared';
import type { DataSource } from 'typeorm';

import { writeHistory } from './history-writer.js';

/**
 * Invented past seasons for the demo Grain Map. The grind effects below are made up so the
 * map shows each kind of cell: a strong effect (aspen), suggestive ones (pine, alder), a
 * wood with no difference (yellow-poplar) and one with too little data (birch).
 */
export const HISTORY_SEASONS = [
  { name: '2023–24 season', startsOn: '2023-09-01', endsOn: '2024-05-31', firstMeet: '2023-10-07' },
  { name: '2024–25 season', startsOn: '2024-09-01', endsOn: '2025-05-31', firstMeet: '2024-10-05' },
  { name: '2025–26 season', startsOn: '2025-09-01', endsOn: '2026-05-31', firstMeet: '2025-10-04' },
] as const;

const DIAMETERS = [280, 300, 330];

export const HISTORY_BATCHES: { season: number; name: string; spec: SimulationSpec }[] = [
  { season: 0, name: 'Aspen Days', spec: { seed: 11, speciesId: 'quaking-aspen', condition: 'green', athletes: 12, resultsPerAthletePerGrind: 4, grinds: { chisel: 0.95, convex: 1, flat: 1.02 }, noise: 0.05, diametersMm: DIAMETERS, includedDeg: 15, chiselWidthMm: 19 } },
  { season: 1, name: 'Pine Rounds', spec: { seed: 12, speciesId: 'eastern-white-pine', condition: 'seasoned', athletes: 8, resultsPerAthletePerGrind: 3, grinds: { chisel: 0.97, convex: 1 }, noise: 0.06, diametersMm: DIAMETERS, includedDeg: 17, chiselWidthMm: 16 } },
  { season: 1, name: 'Alder Open', spec: { seed: 13, speciesId: 'red-alder', condition: 'green', athletes: 8, resultsPerAthletePerGrind: 3, grinds: { convex: 0.99, flat: 1 }, noise: 0.06, diametersMm: DIAMETERS, includedDeg: 19, chiselWidthMm: 12 } },
  { season: 2, name: 'Poplar Cup', spec: { seed: 14, speciesId: 'yellow-poplar', condition: 'seasoned', athletes: 10, resultsPerAthletePerGrind: 4, grinds: { chisel: 1, convex: 1 }, noise: 0.05, diametersMm: DIAMETERS, includedDeg: 16, chiselWidthMm: 19 } },
  { season: 2, name: 'Birch Trial Day', spec: { seed: 15, speciesId: 'paper-birch', condition: 'dry', athletes: 3, resultsPerAthletePerGrind: 2, grinds: { chisel: 0.96, convex: 1 }, noise: 0.05, diametersMm: [300], includedDeg: 15, chiselWidthMm: 19 } },
];

/**
 * Adds the invented history to a seeded demo league: three past seasons of men's underhand
 * results cut by the demo league's own men. Deterministic (fixed seeds); does nothing and
 * returns 0 when the history seasons already exist.
 */
export async function seedHistory(db: DataSource): Promise<number> {
  const [existing] = await db.query('SELECT COUNT(*) AS n FROM seasons WHERE name = ?', [HISTORY_SEASONS[0].name]);
  if (Number(existing.n) > 0) return 0;
  const [event] = await db.query("SELECT id FROM event_types WHERE code = 'underhand-chop'");
  if (event === undefined) throw new Error('the event catalogue has no underhand chop; seed the catalogue first');
  const men: { id: string; club_id: string }[] = await db.query(
    "SELECT id, club_id FROM athletes WHERE FIND_IN_SET('MENS', divisions) > 0 ORDER BY club_id, last_name, first_name, id",
  );
  const needed = Math.max(...HISTORY_BATCHES.map((b) => b.spec.athletes));
  if (men.length < needed) throw new Error(`the history needs ${needed} men in the league, found ${men.length}`);
  return db.transaction(async (m) => {
    const seasonIds: string[] = [];
    for (const season of HISTORY_SEASONS) {
      const id = randomUUID();
      seasonIds.push(id);
      await m.query('INSERT INTO seasons (id, name, starts_on, ends_on, is_current) VALUES (?, ?, ?, ?, 0)', [id, season.name, season.startsOn, season.endsOn]);
    }
    let written = 0;
    for (const [index, batch] of HISTORY_BATCHES.entries()) {
      // Spread each batch over the league so no one club owns a wood's evidence.
      const athletes = new Map(
        Array.from({ length: batch.spec.athletes }, (_, a) => {
          const man = men[(a + index * 3) % men.length]!;
          return [`athlete-${a}`, { athleteId: man.id, clubId: man.club_id }] as const;
        }),
      );
      if (new Set([...athletes.values()].map((a) => a.athleteId)).size < athletes.size) throw new Error('history athletes must be distinct');
      const season = HISTORY_SEASONS[batch.season]!;
      written += await writeHistory(m, {
        seasonId: seasonIds[batch.season]!,
        hostClubId: men[index % men.length]!.club_id,
        eventTypeId: event.id,
        division: 'MENS',
        athletes,
        firstDate: addWeeks(season.firstMeet, index),
        meetName: batch.name,
        results: simulateRaceResults(batch.spec),
      });
    }
    return written;
  });
}

function addWeeks(iso: string, weeks: number): string {
  const date = new Date(`${iso}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + 7 * weeks);
  return date.toISOString().slice(0, 10);
}
