import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { describeSpecies, EXAMPLE_SIMULATION, grainMatrix, simulateRaceResults, withinAthleteRatios, type RaceResult } from '@endgrain/shared';
import request from 'supertest';

import { errorCode } from '../utils/graphql.js';
import { grainCell, grainMap, writeSimulatedHistory, type CellShape } from '../utils/insights-operations.js';
import { demoToken, lookupIds, type Ids } from '../utils/meet-operations.js';
import { createTestApp } from '../utils/test-app.js';

/** The shared rule's cell in the API's shape, to compare number for number. */
function expected(results: readonly RaceResult[], speciesId: string): Omit<CellShape, 'key' | 'condition'>[] {
  return grainMatrix(results, { eventType: 'underhand-chop' })
    .cells.filter((c) => c.speciesId === speciesId)
    .map((c) => ({
      speciesId: c.speciesId, grind: c.grind, results: c.results, athletes: c.athletes,
      medianHundredths: c.time.median, lowHundredths: c.time.low, highHundredths: c.time.high, q1Hundredths: c.time.q1, q3Hundredths: c.time.q3,
      effect: c.effect?.median ?? null, effectLow: c.effect?.low ?? null, effectHigh: c.effect?.high ?? null,
      effectResults: c.effect?.results ?? 0, effectAthletes: c.effect?.athletes ?? 0, clearDifference: c.effect?.excludesNoDifference ?? false, label: c.label,
    }));
}

describe('the Grain Map over real results (MariaDB)', () => {
  let app: INestApplication;
  let ids: Ids;
  let coach: string;
  let speciesId: string;
  let seasonId: string;
  let rows: RaceResult[];
  let filter: Record<string, unknown>;

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    coach = await demoToken(app, 'coach@example.org');
    // An invented wood id per run, so other suites' results never share these cells.
    speciesId = `test-wood-${Date.now().toString(36)}`;
    const simulated = simulateRaceResults({ ...EXAMPLE_SIMULATION, speciesId, diametersMm: [280, 300, 330] });
    const written = await writeSimulatedHistory(app, ids.clubs.LARCH, ids.eventTypes['underhand-chop'], simulated);
    seasonId = written.seasonId;
    rows = simulated.map((r) => ({ ...r, athleteId: written.athletes.get(r.athleteId)!.athleteId }));
    filter = { eventTypeId: ids.eventTypes['underhand-chop'], division: 'MENS', seasonIds: [seasonId] };
  });
  afterAll(async () => {
    await app.close();
  });

  it('returns, cell for cell, what the shared grainMatrix computes on the same rows', async () => {
    const res = await grainMap(app, coach, filter);
    expect(res.errors).toBeUndefined();
    const cells = res.data!.grainMap.cells.filter((c) => c.speciesId === speciesId).map(({ key: _k, condition: _c, ...rest }) => rest);
    // EXAMPLE_SIMULATION: 8 athletes × 5 results per grind = 40 per grind cell, 80 rows in all.
    expect(cells.map((c) => [c.grind, c.results, c.athletes])).toEqual([['chisel', 40, 8], ['convex', 40, 8]]);
    const want = expected(rows, speciesId);
    expect(cells).toHaveLength(want.length);
    cells.forEach((cell, i) => {
      for (const [field, value] of Object.entries(want[i]!)) {
        if (typeof value === 'number') expect([field, cell[field as keyof typeof cell]]).toEqual([field, expect.closeTo(value, 9)]);
        else expect([field, cell[field as keyof typeof cell]]).toEqual([field, value]);
      }
    });
    // The invented 6 % chisel advantage (0.94 vs 1.00) shows up as a ratio below 1.
    expect(cells[0]!.effect!).toBeLessThan(1);
  });

  it('words the species sentence with the shared describeSpecies on the same numbers', async () => {
    const res = await grainMap(app, coach, filter);
    const sentence = res.data!.grainMap.species.find((s) => s.speciesId === speciesId)!.sentence;
    const matrix = grainMatrix(rows, { eventType: 'underhand-chop' });
    expect(sentence).toBe(describeSpecies(matrix, { speciesId, woodLabel: speciesId.replace(/-/g, ' ') }));
  });

  it('lists the results behind a cell with their within-athlete ratios', async () => {
    const res = await grainCell(app, coach, filter, speciesId, 'chisel');
    expect(res.errors).toBeUndefined();
    const detail = res.data!.grainCell;
    expect(detail.rows).toHaveLength(40); // 8 athletes × 5 chisel results
    const want = withinAthleteRatios(rows).filter((r) => rows.find((x) => x.resultId === r.resultId)!.head!.grind === 'chisel');
    const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);
    expect(sorted(detail.rows.map((r) => r.ratio!))).toEqual(sorted(want.map((r) => r.ratio!)).map((v) => expect.closeTo(v, 9)));
    expect(sorted(detail.rows.map((r) => r.normalisedHundredths))).toEqual(sorted(want.map((r) => r.normalisedHundredths)).map((v) => expect.closeTo(v, 9)));
  });

  it('recomputes after a result is corrected instead of serving the cached matrix', async () => {
    const before = (await grainMap(app, coach, filter)).data!.grainMap.cells.find((c) => c.speciesId === speciesId && c.grind === 'convex')!;
    const detail = (await grainCell(app, coach, filter, speciesId, 'convex')).data!.grainCell;
    const target = detail.rows[0]!;
    // A correction as the results writer makes it: new total, updated_at moves.
    const corrected = target.hundredths + 3000;
    await app.get((await import('typeorm')).DataSource).query('UPDATE results SET total_hundredths = ?, time_hundredths = ? WHERE id = ?', [corrected, corrected, target.resultId]);
    const after = (await grainMap(app, coach, filter)).data!.grainMap.cells.find((c) => c.speciesId === speciesId && c.grind === 'convex')!;
    const index = rows.findIndex((r) => r.head!.grind === 'convex' && r.hundredths === target.hundredths);
    const changed = rows.map((r, i) => (i === index ? { ...r, hundredths: corrected } : r));
    const want = expected(changed, speciesId).find((c) => c.grind === 'convex')!;
    expect([after.medianHundredths, after.q3Hundredths, after.highHundredths]).toEqual([want.medianHundredths, want.q3Hundredths, want.highHundredths].map((v) => expect.closeTo(v, 9)));
    // The shared rule itself moves with a 30 s slower time, so the unchanged cache could not pass.
    expect(expected(changed, speciesId)).not.toEqual(expected(rows, speciesId));
    expect(before.results).toBe(after.results);
  });

  it('exports the matrix as CSV with one row per cell', async () => {
    const res = await request(app.getHttpServer())
      .get(`/api/grain-map.csv?eventTypeId=${ids.eventTypes['underhand-chop']}&division=MENS&seasonIds=${seasonId}`)
      .set('authorization', `Bearer ${coach}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('text/csv');
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toMatch(/^species,grind,condition/);
    // Hand-counted: the season holds only this run's two cells.
    expect(lines.slice(1).map((l) => l.split(',').slice(0, 2).join(','))).toEqual([`${speciesId.replace(/-/g, ' ')},chisel`, `${speciesId.replace(/-/g, ' ')},convex`]);
  });

  it('asks for a sign-in and refuses team events with the field named', async () => {
    expect(errorCode(await grainMap(app, undefined, filter))).toBe('UNAUTHENTICATED');
    const team = await grainMap(app, coach, { ...filter, eventTypeId: ids.eventTypes['double-buck'] });
    expect(team.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'eventTypeId' });
    const csv = await request(app.getHttpServer()).get('/api/grain-map.csv').set('authorization', `Bearer ${coach}`);
    // BAD_USER_INPUT answers 422 (server/src/common/errors/http-status.ts).
    expect(csv.status).toBe(422);
  });
});
