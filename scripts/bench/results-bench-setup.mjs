// Shared set-up for the results benchmarks: a separate database (endgrain_bench) on the test
// MariaDB, created with the root socket, migrated and seeded with the demo league; the real
// server built in server/dist, started in this process on a free port. Never the test database.
import { execFileSync } from 'node:child_process';
import { join } from 'node:path';

const ROOT = join(import.meta.dirname, '../..');
export const BENCH_DB = process.env.BENCH_DB_NAME ?? 'endgrain_bench';
const SOCKET = process.env.DB_SOCKET ?? join(ROOT, '.data/test/mariadb/mysqld.sock');

Object.assign(process.env, {
  NODE_ENV: 'test',
  DB_PORT: process.env.DB_PORT ?? '3317',
  DB_NAME: BENCH_DB,
  SEARCH_URL: process.env.SEARCH_URL ?? 'http://127.0.0.1:7710',
  SMTP_URL: process.env.SMTP_URL ?? 'smtp://127.0.0.1:1035',
  SIGN_IN_LIMIT_PER_IP: '1000',
});

function rootSql(sql) {
  execFileSync('mariadb', ['--no-defaults', '--protocol=socket', `--socket=${SOCKET}`, '-uroot', '-e', sql], { stdio: ['ignore', 'ignore', 'inherit'] });
}

/** Creates and migrates the bench database and seeds the demo league once. */
export async function prepareBenchDatabase() {
  const { loadConfig } = await import(join(ROOT, 'server/dist/config/load-config.js'));
  const config = loadConfig();
  if (config.DB_NAME === 'endgrain_test') throw new Error('refusing to benchmark on the test database');
  rootSql(`CREATE DATABASE IF NOT EXISTS \`${BENCH_DB}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    GRANT ALL PRIVILEGES ON \`${BENCH_DB}\`.* TO '${config.DB_USER}'@'127.0.0.1'; FLUSH PRIVILEGES;`);
  await import('reflect-metadata');
  const { createDataSource } = await import(join(ROOT, 'server/dist/database/data-source.js'));
  const { ensureEventCatalogue } = await import(join(ROOT, 'server/dist/meets/event-types.service.js'));
  const { seedDemo } = await import(join(ROOT, 'server/dist/database/seed-demo.js'));
  const db = createDataSource(config);
  await db.initialize();
  await db.runMigrations({ transaction: 'each' });
  await ensureEventCatalogue(db);
  await seedDemo(db, config.DEMO_PASSWORD);
  return { db, config };
}

/** The whole server on a free port; answers its base URL and a signed-in organiser's token. */
export async function startBenchApp() {
  const { createApp } = await import(join(ROOT, 'server/dist/app.factory.js'));
  const app = await createApp({ logger: false });
  await app.listen(0, '127.0.0.1');
  const { port } = app.getHttpServer().address();
  const url = `http://127.0.0.1:${port}`;
  const res = await fetch(`${url}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({
      query: 'mutation($i: SignInInput!) { signIn(input: $i) { accessToken } }',
      variables: { i: { email: 'organiser@example.org', password: process.env.DEMO_PASSWORD ?? 'endgrain-demo-2026' } },
    }),
  });
  const body = await res.json();
  if (!body.data) throw new Error(`sign-in failed: ${JSON.stringify(body.errors)}`);
  return { app, url, token: body.data.signIn.accessToken };
}

/** mulberry32, so every run generates the same data. */
export function prng(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Inserts rows (arrays) in multi-row statements of `chunk` rows. */
export async function insertRows(db, table, columns, rows, chunk = 1000) {
  for (let start = 0; start < rows.length; start += chunk) {
    const part = rows.slice(start, start + chunk);
    const placeholders = part.map(() => `(${columns.map(() => '?').join(',')})`).join(',');
    await db.query(`INSERT INTO ${table} (${columns.join(',')}) VALUES ${placeholders}`, part.flat());
  }
}

export function quantile(sorted, q) {
  const at = (sorted.length - 1) * q;
  const low = Math.floor(at);
  const high = Math.ceil(at);
  return sorted[low] + (sorted[high] - sorted[low]) * (at - low);
}
