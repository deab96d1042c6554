// Importing a 10,000-row results sheet through POST /api/meets/:id/results/import (the whole
// server: upload, checks, matching, ranking, standings, audit, one transaction): rows per
// second, next to a raw multi-row INSERT of the same rows in the same run. Prints figures;
// asserts nothing. Run after building shared and server:  node scripts/bench/results-import.bench.mjs
import { randomUUID } from 'node:crypto';
import { cpus, loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';

import { insertRows, prepareBenchDatabase, prng, startBenchApp } from './results-bench-setup.mjs';

const CLUBS = 10;
const PER_CLUB = 100;
const EVENT_CODES = ['underhand-chop', 'standing-block-chop', 'single-buck', 'bow-saw', 'splitting'];
const DIVISIONS = ['MENS', 'WOMENS'];
const MEET_NAME = 'Bench import meet';

const { db } = await prepareBenchDatabase();
const meetId = await importMeet();
const { app, url, token } = await startBenchApp();
const random = prng(777);
const csv = await sheet();
const rows = csv.split('\r\n').length - 1;

await clearResults();
const dry = await upload(true);
const first = await upload(false);
const again = await upload(false);
const raw = await rawInsert();
const rate = (ms) => Math.round(rows / (ms / 1000)).toLocaleString('en');
console.log(`results import of ${rows.toLocaleString('en')} rows (${(csv.length / 1024 / 1024).toFixed(2)} MB), load average ${loadavg()[0].toFixed(2)} on ${cpus().length} cores`);
console.log(`  dry run (checks only)      ${(dry.ms / 1000).toFixed(2)} s  ${rate(dry.ms)} rows/s  ${JSON.stringify(dry.counts)}`);
console.log(`  import (one transaction)   ${(first.ms / 1000).toFixed(2)} s  ${rate(first.ms)} rows/s  ${JSON.stringify(first.counts)}`);
console.log(`  same sheet again           ${(again.ms / 1000).toFixed(2)} s  ${rate(again.ms)} rows/s  ${JSON.stringify(again.counts)}`);
console.log(`  raw multi-row INSERT       ${(raw / 1000).toFixed(2)} s  ${rate(raw)} rows/s (500 rows a statement, same table shape and indexes)`);
console.log(`  ratio import ÷ raw INSERT: ${(first.ms / raw).toFixed(1)}×`);
await db.query('DROP TABLE IF EXISTS results_raw_bench');
await app.close();
await db.destroy();

/** A closed meet with ten events of 1,000 single entries each (10 clubs × 100 invented athletes). */
async function importMeet() {
  const found = await db.query('SELECT id FROM meets WHERE name = ?', [MEET_NAME]);
  if (found.length) return found[0].id;
  const [season] = await db.query('SELECT id FROM seasons WHERE is_current = 1');
  const clubs = Array.from({ length: CLUBS }, (_, i) => [randomUUID(), `Import club ${i + 1}`, `IMP${i + 1}`, 'Import flats', null, '#2f5d3a', '#c9a66b']);
  await insertRows(db, 'clubs', ['id', 'name', 'short_name', 'region', 'contact_email', 'colour_primary', 'colour_secondary'], clubs);
  const athletes = clubs.flatMap((c, ci) => Array.from({ length: PER_CLUB }, (_, i) => [randomUUID(), c[0], null, 'Importer', `C${ci + 1}N${i + 1}`, 'MENS,WOMENS,MIXED', 'EXPERIENCED', 2024]));
  await insertRows(db, 'athletes', ['id', 'club_id', 'user_id', 'first_name', 'last_name', 'divisions', 'experience', 'first_season_year'], athletes);
  const id = randomUUID();
  await insertRows(db, 'meets', ['id', 'season_id', 'host_club_id', 'name', 'starts_on', 'venue', 'entry_deadline', 'divisions', 'scoring_scheme', 'points_table', 'status'],
    [[id, season.id, clubs[0][0], MEET_NAME, '2026-11-07', 'Bench landing', '2026-11-01 00:00:00', 'MENS,WOMENS,MIXED', 'FIXED_TABLE', '[7,6,5,4,3,2,1]', 'CLOSED']]);
  let position = 0;
  for (const code of EVENT_CODES) {
    const [type] = await db.query('SELECT id FROM event_types WHERE code = ?', [code]);
    for (const division of DIVISIONS) {
      const eventId = randomUUID();
      position += 1;
      await insertRows(db, 'meet_events', ['id', 'meet_id', 'event_type_id', 'division', 'species_id', 'diameter_mm', 'position'], [[eventId, id, type.id, division, 'eastern-white-pine', 304.8, position]]);
      const entries = athletes.map((a) => [randomUUID(), eventId, a[1]]);
      await insertRows(db, 'entries', ['id', 'meet_event_id', 'club_id'], entries);
      await insertRows(db, 'entry_athletes', ['entry_id', 'athlete_id', 'meet_event_id', 'position'], entries.map((e, i) => [e[0], athletes[i][0], eventId, 1]));
    }
  }
  return id;
}

async function sheet() {
  const names = await db.query(
    `SELECT et.name AS event, me.division, c.short_name AS club, CONCAT(a.first_name, ' ', a.last_name) AS athlete
       FROM entries e JOIN meet_events me ON me.id = e.meet_event_id JOIN event_types et ON et.id = me.event_type_id
       JOIN clubs c ON c.id = e.club_id JOIN entry_athletes ea ON ea.entry_id = e.id JOIN athletes a ON a.id = ea.athlete_id
      WHERE me.meet_id = ? ORDER BY me.position, a.last_name`,
    [meetId],
  );
  const grinds = ['flat', 'convex', 'chisel', 'compound'];
  const lines = names.map((n) => {
    const time = 2500 + Math.floor(random() * 4000);
    const watch = (t) => `${Math.floor(t / 100)}.${String(t % 100).padStart(2, '0')}`;
    return [n.event, n.division, n.club, n.athlete, `${watch(time)} / ${watch(time + 7)}`, random() < 0.05 ? '5' : '', 'finished', grinds[Math.floor(random() * 4)], 28 + Math.floor(random() * 8), '6 mm', 'seasoned'].join(',');
  });
  return ['event,division,club,athletes,time,penalty,status,grind,bevel angle,chisel width,condition', ...lines].join('\r\n');
}

async function upload(dryRun) {
  const form = new FormData();
  form.append('file', new Blob([csv], { type: 'text/csv' }), 'bench.csv');
  const started = performance.now();
  const res = await fetch(`${url}/api/meets/${meetId}/results/import${dryRun ? '?dryRun=true' : ''}`, { method: 'POST', headers: { authorization: `Bearer ${token}` }, body: form });
  const body = await res.json();
  const ms = performance.now() - started;
  if (res.status !== 200) throw new Error(`import answered ${res.status}: ${JSON.stringify(body).slice(0, 400)}`);
  return { ms, counts: { imported: body.imported, unchanged: body.unchanged } };
}

async function clearResults() {
  await db.query('DELETE FROM result_audit WHERE meet_id = ?', [meetId]);
  await db.query('DELETE FROM meet_standings WHERE meet_id = ?', [meetId]);
  await db.query('DELETE FROM results WHERE meet_id = ?', [meetId]);
  await db.query("UPDATE meets SET status = 'CLOSED' WHERE id = ?", [meetId]);
}

/** The rows the import stored, written again by hand into a twin of the results table. */
async function rawInsert() {
  await db.query('DROP TABLE IF EXISTS results_raw_bench');
  await db.query('CREATE TABLE results_raw_bench LIKE results');
  const stored = await db.query('SELECT * FROM results WHERE meet_id = ?', [meetId]);
  const columns = Object.keys(stored[0]);
  const values = stored.map((r) => columns.map((c) => (c === 'raw_times' && typeof r[c] !== 'string' ? JSON.stringify(r[c]) : r[c])));
  const started = performance.now();
  await db.transaction(async (m) => insertRows(m, 'results_raw_bench', columns, values, 500));
  return performance.now() - started;
}
