// Generates invented published results into the bench database (never the test database and
// never into a file): seasons, clubs, athletes, meets, meet events, entries and results with
// head setups and blocks. Deterministic. Run: node scripts/bench/generate-bench-results.mjs [count]
import { randomUUID } from 'node:crypto';

import { insertRows, prepareBenchDatabase, prng } from './results-bench-setup.mjs';

const SPECIES = ['eastern-white-pine', 'quaking-aspen', 'yellow-poplar', 'red-alder', 'american-basswood', 'eastern-cottonwood'];
const GRINDS = ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'];
const CONDITIONS = ['GREEN', 'SEASONED', 'DRY', 'PUNKY', 'FROZEN', 'KNOTTY'];
const DIAMETERS = [203.2, 254, 279.4, 304.8, 330.2, 355.6];
const PER_EVENT = 50;
const EVENTS_PER_MEET = 20;

export async function generateBenchResults(db, target = 200_000) {
  const [{ n }] = await db.query('SELECT COUNT(*) AS n FROM results');
  if (Number(n) >= target) return { added: 0, total: Number(n) };
  const random = prng(4242);
  const pick = (list) => list[Math.floor(random() * list.length)];
  const types = (await db.query("SELECT id, result_kind AS kind, uses_head AS usesHead FROM event_types WHERE team_size = 1 ORDER BY code"));
  const combos = types.flatMap((t) => ['MENS', 'WOMENS', 'MIXED'].map((division) => ({ ...t, division })));

  const seasons = Array.from({ length: 4 }, (_, i) => [randomUUID(), `Bench season ${2020 + i}`, `${2020 + i}-09-01`, `${2021 + i}-05-31`, 0]);
  await insertRows(db, 'seasons', ['id', 'name', 'starts_on', 'ends_on', 'is_current'], seasons);
  const clubs = Array.from({ length: 25 }, (_, i) => [randomUUID(), `Bench club ${i + 1}`, `BCH${i + 1}`, 'Bench valley', null, '#2f5d3a', '#c9a66b']);
  await insertRows(db, 'clubs', ['id', 'name', 'short_name', 'region', 'contact_email', 'colour_primary', 'colour_secondary'], clubs);
  const athletes = Array.from({ length: 3000 }, (_, i) => [randomUUID(), clubs[i % clubs.length][0], null, 'Bench', `Athlete${i + 1}`, 'MENS,WOMENS,MIXED', 'EXPERIENCED', 2020]);
  await insertRows(db, 'athletes', ['id', 'club_id', 'user_id', 'first_name', 'last_name', 'divisions', 'experience', 'first_season_year'], athletes);

  const meetCount = Math.ceil((target - Number(n)) / (PER_EVENT * EVENTS_PER_MEET));
  let added = 0;
  for (let m = 0; m < meetCount; m += 1) {
    const season = seasons[m % seasons.length];
    const meetId = randomUUID();
    const date = `${2020 + (m % 4)}-${String(10 + (m % 3)).padStart(2, '0')}-${String(1 + (m % 28)).padStart(2, '0')}`;
    // One meet in twenty is still under way: its results must stay out of the explorer.
    const status = m % 20 === 19 ? 'RUNNING' : 'PUBLISHED';
    await insertRows(db, 'meets', ['id', 'season_id', 'host_club_id', 'name', 'starts_on', 'venue', 'entry_deadline', 'divisions', 'scoring_scheme', 'points_table', 'status'],
      [[meetId, season[0], clubs[m % clubs.length][0], `Bench meet ${m + 1}`, date, 'Bench landing', `${date} 00:00:00`, 'MENS,WOMENS,MIXED', 'FIXED_TABLE', '[7,6,5,4,3,2,1]', status]]);
    const events = [];
    const entries = [];
    const members = [];
    const results = [];
    for (let e = 0; e < EVENTS_PER_MEET; e += 1) {
      const combo = combos[(m + e * 7) % combos.length];
      const eventId = randomUUID();
      const species = pick(SPECIES);
      const diameter = pick(DIAMETERS);
      events.push([eventId, meetId, combo.id, combo.division, species, diameter, e + 1]);
      const start = Math.floor(random() * (athletes.length - PER_EVENT));
      const rows = [];
      for (let k = 0; k < PER_EVENT; k += 1) {
        const athlete = athletes[start + k];
        const entryId = randomUUID();
        entries.push([entryId, eventId, athlete[1]]);
        members.push([entryId, athlete[0], eventId, 1]);
        const roll = random();
        const status = roll < 0.04 ? 'SCRATCH' : roll < 0.07 ? 'DISQUALIFIED' : 'FINISHED';
        const time = combo.kind === 'TIMED' || combo.kind === 'FEWEST_HITS' ? 2000 + Math.floor(random() * 6000) : null;
        const score = combo.kind === 'TIMED' ? null : Math.floor(random() * 25);
        const head = Number(combo.usesHead) === 1;
        rows.push({ entryId, clubId: athlete[1], status, time, score, head });
      }
      const placed = rows.filter((r) => r.status === 'FINISHED').sort((a, b) => (combo.kind === 'SCORED' ? b.score - a.score : (a.score ?? 0) - (b.score ?? 0)) || (a.time ?? 0) - (b.time ?? 0));
      placed.forEach((r, i) => { r.place = i + 1; r.points = Math.max(0, 7 - i); });
      for (const r of rows) {
        results.push([
          randomUUID(), r.entryId, eventId, meetId, season[0], r.clubId, combo.id, combo.division, date, r.status, r.status === 'DISQUALIFIED' ? 'bench' : null,
          JSON.stringify(r.time === null ? [] : [r.time]), r.time, r.score, 0, r.status, r.status === 'DISQUALIFIED' ? 'bench' : null, r.status === 'FINISHED' ? r.time : r.time,
          r.place ?? null, 0, r.points ?? 0, 1, 0, null, r.head ? `Race ${1 + Math.floor(random() * 4)}` : null, r.head ? pick(GRINDS) : null,
          r.head ? 24 + Math.round(random() * 140) / 10 : null, r.head ? Math.round(random() * 120) / 10 : null, species, diameter, pick(CONDITIONS), null,
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
  }
  await db.query('ANALYZE TABLE results, meets');
  return { added, total: Number(n) + added };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const { db } = await prepareBenchDatabase();
  const started = Date.now();
  const { added, total } = await generateBenchResults(db, Number(process.argv[2] ?? 200_000));
  console.log(`bench results: added ${added} in ${((Date.now() - started) / 1000).toFixed(1)} s, ${total} in all`);
  await db.destroy();
}
