// The results explorer over 200,000 generated results: p50 and p95 of the `results` GraphQL
// query (through HTTP, the whole server) for a mix of filters and sorts, next to the same page
// and count as raw SQL in the same run. Prints figures; asserts nothing.
// Run after building shared and server:  node scripts/bench/results-explorer.bench.mjs
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';

import { generateBenchResults } from './generate-bench-results.mjs';
import { prepareBenchDatabase, prng, quantile, startBenchApp } from './results-bench-setup.mjs';

const RESULTS = 200_000;
const ROUNDS = 300;
const WARM_UP = 30;
const PAGE_SIZE = 25;

const { db } = await prepareBenchDatabase();
const generated = await generateBenchResults(db, RESULTS);
const { app, url } = await startBenchApp();

const one = async (sql, params = []) => (await db.query(sql, params))[0];
const type = async (code) => (await one('SELECT id FROM event_types WHERE code = ?', [code])).id;
const season = (await one("SELECT id FROM seasons WHERE name = 'Bench season 2022'")).id;
const club = (await one("SELECT id FROM clubs WHERE short_name = 'BCH7'")).id;
const meet = (await one("SELECT id FROM meets WHERE name = 'Bench meet 42'")).id;
const underhand = await type('underhand-chop');
const throwing = await type('axe-throw');

// What people ask the explorer, each with the SQL the same page needs.
const CASES = [
  { name: "fastest men's underhand", filter: { eventTypeId: underhand, division: 'MENS' }, sort: { field: 'TIME', direction: 'ASC' } },
  { name: 'a club in a season, newest', filter: { seasonId: season, clubId: club }, sort: { field: 'DATE', direction: 'DESC' } },
  { name: 'pine 12–14 in by time', filter: { speciesId: 'eastern-white-pine', diameterMinMm: 304.8, diameterMaxMm: 355.6 }, sort: { field: 'TIME', direction: 'ASC' } },
  { name: 'convex 30–34° by time', filter: { grind: 'CONVEX', bevelMinDeg: 30, bevelMaxDeg: 34 }, sort: { field: 'TIME', direction: 'ASC' } },
  { name: 'green wood by points', filter: { condition: 'GREEN' }, sort: { field: 'POINTS', direction: 'DESC' } },
  { name: 'everything, newest', filter: {}, sort: { field: 'DATE', direction: 'DESC' } },
  { name: 'one meet by place', filter: { meetId: meet }, sort: { field: 'PLACE', direction: 'ASC' } },
  { name: 'axe throw, best score', filter: { eventTypeId: throwing, division: 'MIXED' }, sort: { field: 'SCORE', direction: 'DESC' } },
];

const QUERY = `query($f: ResultsFilter, $s: ResultsSort, $p: PageInput) {
  results(filter: $f, sort: $s, page: $p) { total capped rows { id label clubName meetName eventName totalHundredths place points grind bevelIncludedDeg speciesName diameterMm condition } }
}`;

async function viaGraphql(c, page) {
  const res = await fetch(`${url}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ query: QUERY, variables: { f: c.filter, s: c.sort, p: { page, pageSize: PAGE_SIZE } } }),
  });
  const body = await res.json();
  if (body.errors) throw new Error(JSON.stringify(body.errors));
  return body.data.results.rows.length;
}

const COLUMN = { TIME: 'total_hundredths', DATE: 'meet_date', POINTS: 'points', PLACE: 'place', SCORE: 'score' };
const WHERE = {
  eventTypeId: 'event_type_id = ?', division: 'division = ?', seasonId: 'season_id = ?', clubId: 'club_id = ?', meetId: 'meet_id = ?',
  speciesId: 'species_id = ?', diameterMinMm: 'diameter_mm >= ?', diameterMaxMm: 'diameter_mm <= ?', grind: 'grind = ?',
  bevelMinDeg: 'bevel_included_deg >= ?', bevelMaxDeg: 'bevel_included_deg <= ?', condition: 'block_condition = ?',
};

// The same SQL the server sends, typed by hand and sent straight through the driver: the meets
// not yet public, the page in index order, and the count capped at 10,000 (no names looked up).
async function viaSql(c, page) {
  const keys = Object.keys(c.filter);
  const where = keys.map((k) => `r.${WHERE[k]}`).join(' AND ') || '1 = 1';
  const params = keys.map((k) => c.filter[k]);
  const column = COLUMN[c.sort.field];
  const hidden = (await db.query(
    "SELECT m.id FROM meets m WHERE m.status NOT IN ('PUBLISHED','ARCHIVED') AND EXISTS (SELECT 1 FROM results r WHERE r.meet_id = m.id)",
  )).map((m) => m.id);
  const visible = hidden.length ? `AND r.meet_id NOT IN (${hidden.map(() => '?').join(',')})` : '';
  const [rows] = await Promise.all([
    db.query(
      `SELECT r.* FROM results r WHERE ${where} ${visible} AND r.${column} IS NOT NULL
        ORDER BY r.${column} ${c.sort.direction}, r.id ${c.sort.direction} LIMIT ${PAGE_SIZE} OFFSET ${page * PAGE_SIZE}`,
      [...params, ...hidden],
    ),
    db.query(`SELECT COUNT(*) FROM (SELECT 1 FROM results r WHERE ${where} LIMIT 10001) capped`, params),
  ]);
  if (hidden.length) await db.query(`SELECT COUNT(*) FROM results r WHERE ${where} AND r.meet_id IN (${hidden.map(() => '?').join(',')})`, [...params, ...hidden]);
  return rows.length;
}

async function measure(run) {
  const random = prng(99);
  const times = [];
  for (let i = 0; i < WARM_UP + ROUNDS; i += 1) {
    const c = CASES[i % CASES.length];
    const page = Math.floor(random() * 4);
    const started = performance.now();
    await run(c, page);
    if (i >= WARM_UP) times.push(performance.now() - started);
  }
  return times.sort((a, b) => a - b);
}

async function perCase(run) {
  const out = {};
  for (const c of CASES) {
    const times = [];
    for (let i = 0; i < 25; i += 1) {
      const started = performance.now();
      await run(c, i % 4);
      times.push(performance.now() - started);
    }
    out[c.name] = quantile(times.sort((a, b) => a - b), 0.95);
  }
  return out;
}

const graphql = await measure(viaGraphql);
const sql = await measure(viaSql);
const graphqlCases = await perCase(viaGraphql);
const sqlCases = await perCase(viaSql);
const fmt = (ms) => `${ms.toFixed(1)} ms`;
console.log(`results explorer over ${generated.total.toLocaleString('en')} results (${ROUNDS} queries after ${WARM_UP} warm-up, ${CASES.length} filter/sort mixes, pages 1–4 of ${PAGE_SIZE})`);
console.log(`  machine load average (1 min) ${loadavg()[0].toFixed(2)} on ${(await import('node:os')).cpus().length} cores`);
console.log(`  GraphQL  p50 ${fmt(quantile(graphql, 0.5))}  p95 ${fmt(quantile(graphql, 0.95))}`);
console.log(`  raw SQL  p50 ${fmt(quantile(sql, 0.5))}  p95 ${fmt(quantile(sql, 0.95))}`);
console.log(`  ratio GraphQL ÷ raw SQL: p50 ${(quantile(graphql, 0.5) / quantile(sql, 0.5)).toFixed(2)}×  p95 ${(quantile(graphql, 0.95) / quantile(sql, 0.95)).toFixed(2)}×`);
console.log('  p95 per mix (GraphQL / raw SQL):');
for (const c of CASES) console.log(`    ${c.name.padEnd(28)} ${fmt(graphqlCases[c.name]).padStart(9)} / ${fmt(sqlCases[c.name])}`);
await app.close();
await db.destroy();
