import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';

import { lookupIds, type Ids } from '../utils/meet-operations.js';
import { meetResults, meetStandings, resultsActors, resultsMeet, type ResultsActors } from '../utils/results-operations.js';
import { createTestApp } from '../utils/test-app.js';
import { seedResults } from '../../src/results/seed-results.js';

describe('the demo results seed', () => {
  let app: INestApplication;
  let ids: Ids;
  let tokens: ResultsActors;
  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    tokens = await resultsActors(app);
  });
  afterAll(async () => {
    await app.close();
  });

  it('posts a result for every entry of a closed meet, publishes it, and does it once', async () => {
    const { meetId } = await resultsMeet(app, ids, tokens);
    const db = app.get(DataSource);
    expect(await seedResults(db, { meetId })).toBe(true);
    expect(await seedResults(db, { meetId })).toBe(false);
    const page = (await meetResults(app, meetId)).data!.meetResults;
    expect(page).toMatchObject({ status: 'PUBLISHED', published: true });
    expect(page.events[0]!.results).toHaveLength(5);
    expect(page.events[0]!.waiting).toEqual([]);
    const standings = (await meetStandings(app, meetId)).data!.meetStandings;
    expect(standings.divisions[0]!.clubs.map((c) => c.clubId).sort()).toEqual([ids.clubs.CFORK, ids.clubs.LARCH].sort());
  });

  it('gives the same results for the same seed', async () => {
    const db = app.get(DataSource);
    const runs: string[][] = [];
    for (let i = 0; i < 2; i += 1) {
      const { meetId } = await resultsMeet(app, ids, tokens);
      await seedResults(db, { meetId, seed: 7 });
      const results = (await meetResults(app, meetId)).data!.meetResults.events[0]!.results;
      runs.push(results.map((r) => `${r.status} ${r.rawTimes.join('/')}`).sort());
    }
    expect(runs[1]).toEqual(runs[0]);
  });

  it('leaves a meet that is not closed alone', async () => {
    const { meetId } = await resultsMeet(app, ids, tokens);
    await app.get(DataSource).query("UPDATE meets SET status = 'OPEN' WHERE id = ?", [meetId]);
    expect(await seedResults(app.get(DataSource), { meetId })).toBe(false);
  });
});
