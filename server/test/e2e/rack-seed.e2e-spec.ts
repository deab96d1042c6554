import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';

import { gql } from '../utils/graphql.js';
import { demoToken } from '../utils/meet-operations.js';
import { axe, rack } from '../utils/rack-operations.js';
import { createTestApp } from '../utils/test-app.js';
import { seedRack } from '../../src/rack/seed-rack.js';

describe('the demo racks', () => {
  let app: INestApplication;
  let admin: string;
  beforeAll(async () => {
    app = await createTestApp();
    admin = await demoToken(app, 'admin@example.org');
  });
  afterAll(async () => {
    await app.close();
  });

  it('seeds a club once, with service history whose changes end at the current setup', async () => {
    const short = `S${Date.now().toString(36).slice(-6).toUpperCase()}`;
    const club = await gql<{ createClub: { id: string } }>(
      app,
      'mutation($i: ClubInput!) { createClub(input: $i) { id } }',
      { i: { name: `Seed test club ${short}`, shortName: short, region: 'Test hollow' } },
      { token: admin },
    );
    const clubId = club.data!.createClub.id;
    const db = app.get(DataSource);
    expect(await seedRack(db, { LARCH: clubId })).toBe(4);
    expect(await seedRack(db, { LARCH: clubId })).toBe(0);
    const axes = (await rack(app, clubId, { token: admin })).data!.rack.axes;
    expect(axes.map((a) => a.label)).toEqual(['Old Blue', 'Practice 4', 'Race 1', 'Race 2']);
    const race1 = (await axe(app, axes.find((a) => a.label === 'Race 1')!.id, admin)).data!.axe;
    expect(race1.services.map((s) => s.kind)).toEqual(['INSPECT', 'HONE', 'REGRIND']);
    expect(race1.services[2]!.changes).toEqual([{ field: 'bevelIncludedDeg', before: '16', after: '15' }]);
    expect(race1.lastServicedOn).toBe('2026-11-15');
  });
});
