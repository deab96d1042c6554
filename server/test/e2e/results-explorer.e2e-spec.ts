import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

import { errorCode } from '../utils/graphql.js';
import { lookupIds, type Ids } from '../utils/meet-operations.js';
import {
  athleteResults, explore, publishMeetResults, recordResult, records, resultsActors, resultsMeet, type ResultsActors, type ResultsMeet,
} from '../utils/results-operations.js';
import { createTestApp } from '../utils/test-app.js';

describe('browsing published results across clubs (real MariaDB)', () => {
  let app: INestApplication;
  let ids: Ids;
  let tokens: ResultsActors;
  let meet: ResultsMeet;
  // A diameter no other test uses, so the records for it are this meet's alone.
  const diameterMm = (2903 + (process.pid % 50)) / 10;

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    tokens = await resultsActors(app);
    meet = await resultsMeet(app, ids, tokens, {}, diameterMm);
    // Invented: times 40–44 s; two convex heads at 30° and 34°, the rest chisel at 28°; the 4th is green wood.
    const setups = [
      { grind: 'CONVEX', bevelIncludedDeg: 30, condition: 'SEASONED' }, { grind: 'CHISEL', bevelIncludedDeg: 28, condition: 'SEASONED' },
      { grind: 'CONVEX', bevelIncludedDeg: 34, condition: 'SEASONED' }, { grind: 'CHISEL', bevelIncludedDeg: 28, condition: 'GREEN' },
      { status: 'SCRATCH' },
    ];
    for (const [i, a] of meet.athletes.entries()) {
      const setup = setups[i]!;
      await recordResult(app, tokens.organiser, { entryId: a.entryId, status: 'FINISHED', times: setup.status ? [] : [`${40 + i}.00`], ...setup });
    }
    await publishMeetResults(app, tokens.organiser, meet.meetId);
  });
  afterAll(async () => {
    await app.close();
  });

  it('pages and sorts on the server, empty times last', async () => {
    const first = (await explore(app, { meetId: meet.meetId }, { field: 'TIME', direction: 'ASC' }, { page: 0, pageSize: 2 })).data!.results;
    expect([first.total, first.capped]).toEqual([5, false]);
    expect(first.rows.map((r) => r.totalHundredths)).toEqual([4000, 4100]);
    const last = (await explore(app, { meetId: meet.meetId }, { field: 'TIME', direction: 'ASC' }, { page: 2, pageSize: 2 })).data!.results;
    expect(last.rows.map((r) => r.status)).toEqual(['SCRATCH']);
    const byPoints = (await explore(app, { meetId: meet.meetId }, { field: 'POINTS', direction: 'DESC' })).data!.results;
    // 7-6-5-4-3-2-1: the four finishers earn 7, 6, 5, 4; the scratch 0.
    expect(byPoints.rows.map((r) => r.points)).toEqual([7, 6, 5, 4, 0]);
  });

  it('filters by grind, bevel range, condition, club and diameter range', async () => {
    const count = async (filter: Record<string, unknown>): Promise<number> => (await explore(app, { meetId: meet.meetId, ...filter })).data!.results.total;
    expect(await count({ grind: 'CONVEX' })).toBe(2);
    expect(await count({ bevelMinDeg: 29, bevelMaxDeg: 34 })).toBe(2);
    expect(await count({ grind: 'CHISEL', condition: 'SEASONED' })).toBe(1);
    expect(await count({ clubId: ids.clubs.CFORK })).toBe(2);
    expect(await count({ diameterMinMm: diameterMm - 0.05, diameterMaxMm: diameterMm + 0.05 })).toBe(5);
    expect(await count({ diameterMinMm: diameterMm + 1 })).toBe(0);
    expect(await count({ finishedOnly: true })).toBe(4);
  });

  it('shows nothing of a meet whose results are not published', async () => {
    const hidden = await resultsMeet(app, ids, tokens);
    await recordResult(app, tokens.organiser, { entryId: hidden.athletes[0]!.entryId, status: 'FINISHED', times: ['30.00'] });
    expect((await explore(app, { meetId: hidden.meetId })).data!.results.total).toBe(0);
    expect((await athleteResults(app, hidden.athletes[0]!.id)).data!.athleteResults.results).toEqual([]);
  });

  it('refuses a page larger than 100 results', async () => {
    expect(errorCode(await explore(app, {}, undefined, { page: 0, pageSize: 500 }))).toBe('BAD_USER_INPUT');
  });

  it('exports the current filter as CSV', async () => {
    const res = await request(app.getHttpServer()).get(`/api/results.csv?meetId=${meet.meetId}&grind=CONVEX&sort=TIME&direction=DESC`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    const lines = res.text.replace(/^\uFEFF/, '').trim().split('\r\n');
    expect(lines).toHaveLength(3);
    expect(lines[0]).toMatch(/^meet,date,event,division,place,athletes,club,time,/);
    // DESC by time: the 42.00 convex run (3rd) comes before the 40.00 one (1st).
    expect(lines[1]).toContain(`,Underhand chop,Men's,3,${meet.athletes[2]!.name},Larchmere College Woodsmen,42.00,42.00,,,5,finished,,,convex,34,`);
    expect(lines[2]).toContain(',1,');
    expect((await request(app.getHttpServer()).get('/api/results.csv?division=COED')).status).toBe(422);
  });

  it('keeps the best time per event, species and diameter as a record, with its meet', async () => {
    const list = (await records(app, { eventTypeId: ids.eventTypes['underhand-chop'], speciesId: 'eastern-white-pine' })).data!.records;
    const mine = list.filter((r) => Math.abs((r.diameterMm ?? 0) - diameterMm) < 0.01);
    expect(mine).toHaveLength(1);
    expect(mine[0]!.result).toMatchObject({ label: meet.athletes[0]!.name, totalHundredths: 4000 });
    expect(mine[0]!.result.meetName).toMatch(/^Test meet/);
  });

  it("lists an athlete's results and personal best per event and diameter", async () => {
    const page = (await athleteResults(app, meet.athletes[1]!.id)).data!.athleteResults;
    expect(page.results).toEqual([{ meetId: meet.meetId, place: 2 }]);
    expect(page.personalBests).toEqual([{ eventName: 'Underhand chop', diameterMm, result: { totalHundredths: 4100 } }]);
  });
});
