// The Grain Map over generated men's underhand results: p50 and p95 of the `grainMap` GraphQL
// query (through HTTP, the whole server) next to a raw SQL aggregate for the same cells (count and
// athletes per wood and grind, same filters) in the same run. Prints figures; asserts nothing.
//
// Strategy measured: no roll-up table. The server reads a narrow projection through the
// (event_type_id, division, …) indexes and computes medians, ratios and intervals in Node with
// the shared rules; the answer is cached per filter under a stamp (result count and newest
// updated_at of results, meets and trials), so a corrected result changes the stamp and the next
// read recomputes. "fresh" requests defeat the cache (a distinct, harmless diameter bound each
// time); "cached" ones repeat one filter.
//
// Runs in its own database (endgrain_bench_map), dropped at the end unless --keep.
// Run after building shared and server:  node scripts/bench/grain-map.bench.mjs [--rows 20000] [--keep]
// 1,000,000 rows (--rows 1000000) is the target size; the default is 20,000 because on a loaded
// two-core machine a fresh (uncached) map already takes about a second at that size, and
// generating a million rows would take far longer than the run it serves.
import { execFileSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';

const flag = (name) => process.argv.indexOf(name);
const ROWS = flag('--rows') > 0 ? Number(process.argv[flag('--rows') + 1]) : 20_000;
const KEEP = flag('--keep') > 0;
const FRESH_ROUNDS = Number(process.env.BENCH_FRESH_ROUNDS ?? 10);
const CACHED_ROUNDS = 100;
process.env.BENCH_DB_NAME = 'endgrain_bench_map';

const { prepareBenchDatabase, quantile, startBenchApp } = await import('./results-bench-setup.mjs');
const { generateGrainMapResults } = await import('./generate-grain-map-results.mjs');

const started = performance.now();
const { db, config } = await prepareBenchDatabase();
const generated = await generateGrainMapResults(db, ROWS, console.log);
console.log(`generated ${generated.added} results (${generated.total} men's underhand in all) in ${((performance.now() - started) / 1000).toFixed(0)} s`);
const { app, url, token } = await startBenchApp();

const [{ id: underhand }] = await db.query("SELECT id FROM event_types WHERE code = 'underhand-chop'");
const seasons = (await db.query("SELECT id FROM seasons WHERE name LIKE 'Map bench season %' ORDER BY name LIMIT 2")).map((s) => s.id);
const clubs = (await db.query("SELECT id FROM clubs WHERE short_name IN ('MAP1','MAP2','MAP3')")).map((c) => c.id);

const CASES = [
  { name: "all men's underhand", filter: { eventTypeId: underhand, division: 'MENS' } },
  { name: 'two seasons', filter: { eventTypeId: underhand, division: 'MENS', seasonIds: seasons } },
  { name: 'three clubs', filter: { eventTypeId: underhand, division: 'MENS', clubIds: clubs } },
  { name: 'green, 12–14 in', filter: { eventTypeId: underhand, division: 'MENS', condition: 'green', diameterMinMm: 304.8, diameterMaxMm: 355.6 } },
  { name: 'bevel 14–16°', filter: { eventTypeId: underhand, division: 'MENS', bevelBand: 'bevel-14-16' } },
];

const QUERY = 'query($f: GrainMapFilter!) { grainMap(filter: $f) { totalResults cells { speciesId grind results athletes effect label } } }';

async function viaGraphql(filter) {
  const res = await fetch(`${url}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
    body: JSON.stringify({ query: QUERY, variables: { f: filter } }),
  });
  const body = await res.json();
  if (body.errors) throw new Error(JSON.stringify(body.errors));
  return body.data.grainMap.cells.length;
}

// The same rows the server reads, counted per cell by the database itself.
async function viaSql(filter) {
  const clauses = ["r.event_type_id = ?", "r.final_status = 'FINISHED'", 'r.total_hundredths IS NOT NULL', 'r.species_id IS NOT NULL', 'r.diameter_mm > 0', 'r.grind IS NOT NULL'];
  const params = [filter.eventTypeId];
  const add = (clause, ...values) => { clauses.push(clause); params.push(...values); };
  if (filter.division) add('r.division = ?', filter.division);
  if (filter.seasonIds) add(`r.season_id IN (${filter.seasonIds.map(() => '?').join(',')})`, ...filter.seasonIds);
  if (filter.clubIds) add(`r.club_id IN (${filter.clubIds.map(() => '?').join(',')})`, ...filter.clubIds);
  if (filter.condition) add('r.block_condition = ?', filter.condition.toUpperCase());
  if (filter.diameterMinMm != null) add('r.diameter_mm >= ?', filter.diameterMinMm);
  if (filter.diameterMaxMm != null) add('r.diameter_mm <= ?', filter.diameterMaxMm);
  if (filter.bevelBand) add('r.bevel_included_deg >= ? AND r.bevel_included_deg < ?', 14, 16);
  const rows = await db.query(
    `SELECT r.species_id, r.grind, COUNT(*) AS n, COUNT(DISTINCT ea.athlete_id) AS athletes
     FROM results r JOIN meets m ON m.id = r.meet_id AND m.status IN ('PUBLISHED','ARCHIVED') JOIN entry_athletes ea ON ea.entry_id = r.entry_id
     WHERE ${clauses.join(' AND ')} GROUP BY r.species_id, r.grind`,
    params,
  );
  return rows.length;
}

async function timed(rounds, run) {
  const times = [];
  for (let i = 0; i < rounds; i += 1) {
    const t = performance.now();
    await run(i);
    times.push(performance.now() - t);
  }
  return times.sort((a, b) => a - b);
}

const ms = (v) => `${v.toFixed(1)} ms`;
console.log(`\nGrain Map, ${generated.total} results, load ${loadavg().map((l) => l.toFixed(2)).join(' ')}; fresh ${FRESH_ROUNDS} rounds, cached ${CACHED_ROUNDS}`);
console.log('case                   | fresh p50 | fresh p95 | cached p50 | cached p95 | SQL p50 | SQL p95 | fresh p50 ÷ SQL p50 | cells');
try {
  for (const c of CASES) {
    await viaGraphql(c.filter);
    await viaSql(c.filter);
    // A lower bound a hair under the case's own (blocks come in whole sizes) leaves the same rows but a new cache key.
    const fresh = await timed(FRESH_ROUNDS, (i) => viaGraphql({ ...c.filter, diameterMinMm: (c.filter.diameterMinMm ?? 1) - (i + 1) / 10_000 }));
    const cached = await timed(CACHED_ROUNDS, () => viaGraphql(c.filter));
    const sql = await timed(CACHED_ROUNDS, () => viaSql(c.filter));
    const cells = await viaGraphql(c.filter);
    const sqlCells = await viaSql(c.filter);
    console.log(`${c.name.padEnd(22)} | ${ms(quantile(fresh, 0.5)).padStart(9)} | ${ms(quantile(fresh, 0.95)).padStart(9)} | ${ms(quantile(cached, 0.5)).padStart(10)} | ${ms(quantile(cached, 0.95)).padStart(10)} | ${ms(quantile(sql, 0.5)).padStart(7)} | ${ms(quantile(sql, 0.95)).padStart(7)} | ${(quantile(fresh, 0.5) / quantile(sql, 0.5)).toFixed(1).padStart(19)} | ${cells} (SQL ${sqlCells})`);
  }
} finally {
  await app.close();
  await db.destroy();
  if (!KEEP) {
    const socket = process.env.DB_SOCKET ?? join(import.meta.dirname, '../../.data/test/mariadb/mysqld.sock');
    execFileSync('mariadb', ['--no-defaults', '--protocol=socket', `--socket=${socket}`, '-uroot', '-e', `DROP DATABASE \`${config.DB_NAME}\``]);
    console.log(`dropped ${config.DB_NAME}`);
  }
}
