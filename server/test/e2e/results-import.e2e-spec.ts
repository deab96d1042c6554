import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { lookupIds, type Ids } from '../utils/meet-operations.js';
import { importSheet, meetResults, resultAudit, resultsActors, resultsMeet, type ResultsActors, type ResultsMeet } from '../utils/results-operations.js';
import { createTestApp } from '../utils/test-app.js';

const HEADER = 'Event,Division,Club,Athletes,Time,Time 2,Penalty,Status,Reason,Grind,Bevel Angle,Chisel Width,Condition';

/** The five entries of a results meet, each a row; times 40.00, 41.00, … unless `times` says otherwise. */
function sheet(meet: ResultsMeet, clubs: Record<string, string>, times: string[] = []): string {
  const rows = meet.athletes.map((a, i) => {
    const club = a.clubId === clubs['LARCH'] ? 'LARCH' : 'Cedar Fork Axe Club';
    return `underhand chop,Men's,${club},${a.name},${times[i] ?? `${40 + i}.00`},,,,,convex,32,1/4 in,seasoned`;
  });
  return [HEADER, ...rows].join('\r\n');
}

describe('results sheet import over REST (real MariaDB)', () => {
  let app: INestApplication;
  let ids: Ids;
  let tokens: ResultsActors;
  let athlete: string;

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    tokens = await resultsActors(app);
    athlete = tokens.athlete;
  });
  afterAll(async () => {
    await app.close();
  });

  const resultCount = async (meetId: string): Promise<number> =>
    (await meetResults(app, meetId, tokens.organiser)).data!.meetResults.events.flatMap((e) => e.results).length;

  it('saves nothing from a sheet with one bad row and names its row and column', async () => {
    const meet = await resultsMeet(app, ids, tokens);
    const res = await importSheet(app, tokens.organiser, meet.meetId, sheet(meet, ids.clubs, ['40.00', '41.00', '1:5.3']));
    expect(res.status).toBe(422);
    // Row 4 of the file: the header is row 1, so the third result is row 4.
    expect(res.body.errors).toEqual([{ row: 4, column: 'time', message: 'row 4, time: "1:5.3" is not m:ss.hh' }]);
    expect(await resultCount(meet.meetId)).toBe(0);
  });

  it('adds nothing when the same sheet comes twice, and only the changed row after an edit', async () => {
    const meet = await resultsMeet(app, ids, tokens);
    const text = sheet(meet, ids.clubs);
    const first = await importSheet(app, tokens.organiser, meet.meetId, text);
    expect([first.status, first.body.imported, first.body.unchanged]).toEqual([200, 5, 0]);
    const second = await importSheet(app, tokens.organiser, meet.meetId, text);
    expect([second.status, second.body.imported, second.body.unchanged]).toEqual([200, 0, 5]);
    expect(await resultCount(meet.meetId)).toBe(5);
    expect((await resultAudit(app, tokens.organiser, meet.meetId)).data!.resultAudit).toHaveLength(5);

    const edited = await importSheet(app, tokens.organiser, meet.meetId, sheet(meet, ids.clubs, ['40.00', '41.00', '39.50']));
    expect([edited.body.imported, edited.body.unchanged]).toEqual([1, 4]);
    const results = (await meetResults(app, meet.meetId, tokens.organiser)).data!.meetResults.events[0]!.results;
    // Hand-worked: 39.50 now wins; 40.00 and 41.00 drop to 2nd and 3rd.
    expect(results.map((r) => [r.entryId, r.place])).toEqual([2, 0, 1, 3, 4].map((i, k) => [meet.athletes[i]!.entryId, k + 1]));
    expect(results[0]).toMatchObject({ grind: 'CONVEX', bevelIncludedDeg: 32, chiselWidthMm: 6.35, condition: 'SEASONED', diameterMm: 304.8 });
  });

  it('checks a dry run fully and saves nothing', async () => {
    const meet = await resultsMeet(app, ids, tokens);
    const res = await importSheet(app, tokens.organiser, meet.meetId, sheet(meet, ids.clubs), { dryRun: true });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ imported: 5, unchanged: 0, dryRun: true });
    expect(res.body.rows[0]).toMatchObject({ row: 2, action: 'NEW', officialHundredths: 4000 });
    expect(await resultCount(meet.meetId)).toBe(0);
  });

  it('names the row of an athlete the meet has no entry for', async () => {
    const meet = await resultsMeet(app, ids, tokens);
    const text = `${HEADER}\r\nUnderhand chop,Mens,LARCH,Nobody Atall,40.00,,,,,,,,`;
    const res = await importSheet(app, tokens.organiser, meet.meetId, text);
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([{ row: 2, column: 'athletes', message: `row 2, athletes: Larchmere College Woodsmen has no entry of "Nobody Atall" in Underhand chop (Men's)` }]);
  });

  it('answers 401 without a token and 403 to coaches and athletes', async () => {
    const meet = await resultsMeet(app, ids, tokens);
    const text = sheet(meet, ids.clubs);
    expect((await importSheet(app, undefined, meet.meetId, text)).status).toBe(401);
    expect((await importSheet(app, tokens.coach, meet.meetId, text)).status).toBe(403);
    expect((await importSheet(app, athlete, meet.meetId, text)).status).toBe(403);
    expect(await resultCount(meet.meetId)).toBe(0);
  });

  it('refuses a workbook, a file that is not text, and an oversized sheet', async () => {
    const meet = await resultsMeet(app, ids, tokens);
    const workbook = await importSheet(app, tokens.organiser, meet.meetId, 'PK\u0003\u0004 not really', { filename: 'results.xlsx', type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' });
    expect(workbook.status).toBe(422);
    expect(workbook.body.errors[0].message).toMatch(/^file: this is a spreadsheet workbook, not CSV/);
    const image = await importSheet(app, tokens.organiser, meet.meetId, 'GIF89a', { filename: 'results.gif', type: 'image/gif' });
    expect(image.body.errors[0]).toMatchObject({ column: 'file', message: 'file: "results.gif" is not a CSV file; upload a .csv sheet' });
    const huge = await importSheet(app, tokens.organiser, meet.meetId, `${HEADER}\n${'x,'.repeat(3 * 1024 * 1024)}`);
    expect(huge.status).toBe(422);
    expect(huge.body).toMatchObject({ field: 'file', message: 'A results sheet must be 5 MB or smaller; split a larger one.' });
  });

  it('answers 404 for a meet that does not exist', async () => {
    const res = await importSheet(app, tokens.organiser, '00000000-0000-4000-8000-000000000000', 'event\nx');
    expect(res.status).toBe(404);
  });
});
