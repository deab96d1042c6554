// Search speed of the local search fake, driven through the official SDK, next to a bare
// in-process MiniSearch index over the same documents. Prints figures; asserts nothing.
// Run after `npm run build -w search-fake`:  node scripts/bench/search.bench.mjs
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';

import { Meilisearch } from 'meilisearch';
import MiniSearch from 'minisearch';

import { startSearchFake } from '../../search-fake/dist/server.js';

const ARTICLE_COUNT = 10_000;
const QUERY_COUNT = 200;
const MASTER_KEY = 'bench-master-key-0123456789';
const SEARCHABLE = ['title', 'summary', 'body', 'tags'];

// mulberry32: a small seeded generator, so every run indexes and asks the same things.
function prng(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const random = prng(20261201);
const pick = (list) => list[Math.floor(random() * list.length)];
const int = (low, high) => low + Math.floor(random() * (high - low + 1));

// Invented words only: made-up woods, grinds and conditions, and syllable filler.
const WOODS = ['brindlewood', 'marrowpine', 'quillbark', 'sallowgum', 'tarnbeech', 'veltspruce', 'wickalder', 'ossenmaple'];
const GRINDS = ['flatbank', 'roundshoulder', 'splitcheek', 'narrowhollow', 'broadkeel'];
const CONDITIONS = ['sodden', 'parched', 'rimed', 'seasoned', 'freshcut'];
const SYLLABLES = ['bra', 'dol', 'ken', 'mir', 'tos', 'vel', 'quo', 'rin', 'sab', 'lut', 'gor', 'fen', 'pel', 'hax', 'nim', 'wur'];
const FILLER = Array.from({ length: 1500 }, () => Array.from({ length: int(2, 4) }, () => pick(SYLLABLES)).join(''));
const words = (count) => Array.from({ length: count }, () => pick(FILLER)).join(' ');

function article(i) {
  const wood = pick(WOODS);
  const grind = pick(GRINDS);
  const condition = pick(CONDITIONS);
  return {
    id: `art-${i}`,
    title: `${grind} on ${condition} ${wood} ${words(3)}`,
    summary: words(int(10, 20)),
    body: `${words(int(40, 80))} ${wood} ${words(int(10, 30))}`,
    species: wood,
    grind,
    condition,
    diameter: int(200, 400),
    tags: [grind, condition, pick(FILLER)],
  };
}

function typo(word) {
  const at = int(1, word.length - 2);
  return word.slice(0, at) + word.slice(at + 1);
}

function queries() {
  const list = [];
  for (let i = 0; i < QUERY_COUNT; i += 1) {
    const wood = pick(WOODS);
    const kind = i % 8;
    if (kind === 0) list.push({ q: wood });
    else if (kind === 1) list.push({ q: wood.slice(0, int(3, 5)) });
    else if (kind === 2) list.push({ q: typo(wood) });
    else if (kind === 3) list.push({ q: `${pick(GRINDS)} ${pick(CONDITIONS)}` });
    else if (kind === 4) list.push({ q: pick(FILLER), filter: `species = ${wood}` });
    else if (kind === 5) list.push({ q: typo(pick(GRINDS)), facets: ['species', 'condition', 'diameter'] });
    else if (kind === 6) list.push({ q: `${pick(CONDITIONS)} ${wood.slice(0, 4)}`, filter: ['diameter 250 TO 350', ['grind = flatbank', 'grind = broadkeel']], sort: ['diameter:asc'] });
    else list.push({ q: null, filter: `condition = ${pick(CONDITIONS)}`, facets: ['grind'] });
  }
  return list;
}

function percentile(sorted, p) {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

async function timeAll(list, run) {
  for (const query of list.slice(0, 20)) await run(query); // warm-up
  const times = [];
  for (const query of list) {
    const start = performance.now();
    await run(query);
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { p50: percentile(times, 50), p95: percentile(times, 95), max: times[times.length - 1] };
}

// The same matching rules the fake applies: prefix on the last word, 1 typo from 5 letters, 2 from 9.
function miniSearchRunner(docs) {
  const mini = new MiniSearch({ fields: SEARCHABLE, idField: 'id' });
  // Earlier fields weigh more, as in the fake.
  const boost = Object.fromEntries(SEARCHABLE.map((field, i) => [field, SEARCHABLE.length - i]));
  mini.addAll(docs);
  const byId = new Map(docs.map((doc) => [doc.id, doc]));
  const matchesFilter = (doc, filter) => {
    if (filter === undefined) return true;
    if (typeof filter === 'string') {
      const [field, value] = filter.split(' = ');
      return String(doc[field]).toLowerCase() === value.toLowerCase();
    }
    return doc.diameter >= 250 && doc.diameter <= 350 && (doc.grind === 'flatbank' || doc.grind === 'broadkeel');
  };
  return async ({ q, filter }) => {
    if (q === null) return docs.filter((doc) => matchesFilter(doc, filter)).slice(0, 20);
    return mini
      .search(q, {
        boost,
        prefix: (_term, i, all) => i === all.length - 1,
        fuzzy: (term) => (term.length >= 9 ? 2 : term.length >= 5 ? 1 : 0),
        filter: filter === undefined ? undefined : (result) => matchesFilter(byId.get(result.id), filter),
      })
      .slice(0, 20);
  };
}

const dataDir = mkdtempSync(join(tmpdir(), 'search-bench-'));
const fake = await startSearchFake({ port: 0, dataDir, masterKey: MASTER_KEY });
try {
  const docs = Array.from({ length: ARTICLE_COUNT }, (_, i) => article(i));
  const client = new Meilisearch({ host: fake.url, apiKey: MASTER_KEY });
  const index = client.index('bench-articles');
  await index.updateSettings({
    // As Endgrain's articles index will be set up: text fields searched, facets filtered.
    searchableAttributes: SEARCHABLE,
    filterableAttributes: ['species', 'grind', 'condition', 'diameter', 'tags'],
    sortableAttributes: ['diameter'],
  }).waitTask();
  const indexStart = performance.now();
  const tasks = await Promise.all(index.addDocumentsInBatches(docs, 1000, { primaryKey: 'id' }));
  const finished = await client.tasks.waitForTasks(tasks, { timeout: 120_000, interval: 20 });
  const failed = finished.filter((task) => task.status !== 'succeeded');
  if (failed.length > 0) throw new Error(`indexing failed: ${JSON.stringify(failed[0].error)}`);
  const indexMs = performance.now() - indexStart;
  // Let the debounced snapshot write (a blocking JSON dump of every document) finish before timing.
  await new Promise((resolve) => setTimeout(resolve, 1500));

  const list = queries();
  const sdk = await timeAll(list, ({ q, ...params }) => index.search(q, params));
  const direct = await timeAll(list, miniSearchRunner(docs));

  const fmt = (n) => n.toFixed(2).padStart(7);
  console.log(`articles: ${ARTICLE_COUNT}, queries: ${list.length} (+20 warm-up), node ${process.version}`);
  console.log(`indexing through the SDK: ${(indexMs / 1000).toFixed(2)} s`);
  console.log(`                          p50 ms   p95 ms   max ms`);
  console.log(`search-fake via SDK      ${fmt(sdk.p50)}  ${fmt(sdk.p95)}  ${fmt(sdk.max)}`);
  console.log(`MiniSearch in process    ${fmt(direct.p50)}  ${fmt(direct.p95)}  ${fmt(direct.max)}`);
  console.log(`ratio (fake / direct)    ${fmt(sdk.p50 / direct.p50)}  ${fmt(sdk.p95 / direct.p95)}`);
} finally {
  await fake.close();
  rmSync(dataDir, { recursive: true, force: true });
}
