// Generates invented men's underhand results for the Grain Map benchmark into the bench database
// named by BENCH_DB_NAME (never the test database, never a file): seasons, clubs, athletes who
// race many times, meets, entries and results with a recorded head and block. Each wood and grind
// gets a made-up effect so the map has strong, suggestive and thin cells. Deterministic.
import { randomUUID } from 'node:crypto';

import { insertRows, prng } from './results-bench-setup.mjs';

const SPECIES = ['eastern-white-pine', 'quaking-aspen', 'yellow-poplar', 'red-alder', 'american-basswood', 'eastern-cottonwood', 'paper-birch'];
const GRINDS = ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'];
const CONDITIONS = ['GREEN', 'SEASONED', 'DRY'];
const DIAMETERS = [254, 279.4, 304.8, 330.2, 355.6];
const PER_EVENT = 40;
const ATHLETES = 4000;

/** Adds results until `target` men's underhand results exist; answers how many were added. */
export async function generateGrainMapResults(db, target, log = () => undefined) {
  const [{ id: typeId }] = await db.query("SELECT id FROM event_types WHERE code = 'underhand-chop'");
  const [{ n }] = await db.query("SELECT COUNT(*) AS n FROM results WHERE event_type_id = ? AND division = 'MENS'", [typeId]);
  if (Number(n) >= target) return { added: 0, total: Number(n) };
  const random = prng(7070);
  const pick = (list) => list[Math.floor(random() * list.length)];
  // Invented effects: most grinds within ±2 %, a few clearer ones; birch and cottonwood stay rare.
  const effect = new Map(SPECIES.flatMap((s) => GRINDS.map((g) => [`${s}~${g}`, 0.96 + random() * 0.08])));

  const seasons = Array.from({ length: 6 }, (_, i) => [randomUUID(), `Map bench season ${2018 + i}`, `${2018 + i}-09-01`, `${2019 + i}-05-31`, 0]);
  await insertRows(db, 'seasons', ['id', 'name', 'starts_on', 'ends_on', 'is_current'], seasons);
  const clubs = Array.from({ length: 30 }, (_, i) => [randomUUID(), `Map bench club ${i + 1}`, `MAP${i + 1}`, 'Bench valley', null, '#2f5d3a', '#c9a66b']);
  await insertRows(db, 'clubs', ['id', 'name', 'short_name', 'region', 'contact_email', 'colour_primary', 'colour_secondary'], clubs);
  const athletes = Array.from({ length: ATHLETES }, (_, i) => ({ id: randomUUID(), clubId: clubs[i % clubs.length][0], base: 2400 + random() * 3600 }));
  await insertRows(db, 'athletes', ['id', 'club_id', 'user_id', 'first_name', 'last_name', 'divisions', 'experience', 'first_season_year'],
    athletes.map((a, i) => [a.id, a.clubId, null, 'Bench', `Chopper${i + 1}`, 'MENS', 'EXPERIENCED', 2018]));

  const eventsNeeded = Math.ceil((target - Number(n)) / PER_EVENT);
  const EVENTS_PER_MEET = 10;
  let added = 0;
  for (let m = 0; m * EVENTS_PER_MEET < eventsNeeded; m += 1) {
    const season = seasons[m % seasons.length];
    const year = 2018 + (m % seasons.length);
    const date = `${year}-${String(10 + (m % 3)).padStart(2, '0')}-${String(1 + (m % 28)).padStart(2, '0')}`;
    const meetId = randomUUID();
    await insertRows(db, 'meets', ['id', 'season_id', 'host_club_id', 'name', 'starts_on', 'venue', 'entry_deadline', 'divisions', 'scoring_scheme', 'points_table', 'status'],
      [[meetId, season[0], clubs[m % clubs.length][0], `Map bench meet ${m + 1}`, date, 'Bench landing', `${date} 00:00:00`, 'MENS', 'FIXED_TABLE', '[7,6,5,4,3,2,1]', 'PUBLISHED']]);
    const events = [];
    const entries = [];
    const members = [];
    const results = [];
    for (let e = 0; e < EVENTS_PER_MEET; e += 1) {
      const eventId = randomUUID();
      const species = random() < 0.04 ? pick(SPECIES.slice(5)) : pick(SPECIES.slice(0, 5));
      const diameter = pick(DIAMETERS);
      const condition = pick(CONDITIONS);
      events.push([eventId, meetId, typeId, 'MENS', species, diameter, e + 1]);
      // Athletes come from a small pool per meet, so the same people race on many woods and grinds.
      const start = Math.floor(random() * (ATHLETES - PER_EVENT));
      for (let k = 0; k < PER_EVENT; k += 1) {
        const athlete = athletes[start + k];
        const entryId = randomUUID();
        const grind = pick(GRINDS);
        const time = Math.round(athlete.base * (diameter / 300) ** 2 * effect.get(`${species}~${grind}`) * (1 + (random() - 0.5) * 0.1));
        const status = random() < 0.05 ? 'SCRATCH' : 'FINISHED';
        entries.push([entryId, eventId, athlete.clubId]);
        members.push([entryId, athlete.id, eventId, 1]);
        results.push([
          randomUUID(), entryId, eventId, meetId, season[0], athlete.clubId, typeId, 'MENS', date, status, null, JSON.stringify([time]), time, null, 0, status, null,
          time, status === 'FINISHED' ? k + 1 : null, 0, 0, 1, 0, null, `Race ${1 + (k % 3)}`, grind, 12 + Math.round(random() * 100) / 10,
          grind === 'CHISEL' ? 12 + Math.round(random() * 80) / 10 : null, species, diameter, condition, null,
        ]);
      }
    }
    await insertRows(db, 'meet_events', ['id', 'meet_id', 'event_type_id', 'division', 'species_id', 'diameter_mm', 'position'], events);
    await insertRows(db, 'entries', ['id', 'meet_event_id', 'club_id'], entries);
    await insertRows(db, 'entry_athletes', ['entry_id', 'athlete_id', 'meet_event_id', 'position'], members);
    await insertRows(db, 'results', [
      'id', 'entry_id', 'meet_event_id', 'meet_id', 'season_id', 'club_id', 'event_type_id', 'division', 'meet_date', 'status', 'dq_reason', 'raw_times',
      'time_hundredths', 'score', 'penalty_hundredths', 'final_status', 'final_reason', 'total_hundredths', 'place', 'tied', 'points', 'counts_for_club',
      'provisional', 'axe_id', 'axe_label', 'grind', 'bevel_included_deg', 'chisel_width_mm', 'species_id', 'diameter_mm', 'block_condition', 'recorded_by',
    ], results, 500);
    added += results.length;
    if (m % 50 === 0) log(`  generated ${added} results`);
  }
  await db.query('ANALYZE TABLE results, meets, entry_athletes');
  return { added, total: Number(n) + added };
}
