import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { trialEvidence } from '@endgrain/shared';
import { DataSource, In } from 'typeorm';

import { gql } from '../utils/graphql.js';
import { demoToken } from '../utils/meet-operations.js';
import { trial, trials } from '../utils/trials-operations.js';
import { createTestApp } from '../utils/test-app.js';
import { seedRack } from '../../src/rack/seed-rack.js';
import { TrialEntity } from '../../src/trials/entities/trial.entity.js';
import { TrialSummaryEntity } from '../../src/trials/entities/trial-summary.entity.js';
import { toTrialInput } from '../../src/trials/trial-mapping.js';
import { seedTrials } from '../../src/trials/seed-trials.js';

describe('the demo trials', () => {
  let app: INestApplication;
  let admin: string;
  beforeAll(async () => {
    app = await createTestApp();
    admin = await demoToken(app, 'admin@example.org');
  });
  afterAll(async () => {
    await app.close();
  });

  const freshClub = async (label: string) => {
    const short = `${label}${Date.now().toString(36).slice(-5).toUpperCase()}`;
    const res = await gql<{ createClub: { id: string } }>(
      app,
      'mutation($i: ClubInput!) { createClub(input: $i) { id } }',
      { i: { name: `Trial seed club ${short}`, shortName: short, region: 'Test hollow' } },
      { token: admin },
    );
    return res.data!.createClub.id;
  };

  it('seeds a club with a rack once, and gives the Grain Map trial evidence', async () => {
    const clubId = await freshClub('T');
    const db = app.get(DataSource);
    expect(await seedTrials(db, { LARCH: clubId })).toBe(0); // no rack yet: left alone
    await seedRack(db, { LARCH: clubId });
    expect(await seedTrials(db, { LARCH: clubId })).toBe(7);
    expect(await seedTrials(db, { LARCH: clubId })).toBe(0);

    const list = (await trials(app, clubId, admin)).data!.trials.trials;
    expect(list).toHaveLength(7);
    const punky = list.find((t) => t.condition === 'PUNKY')!;
    const detail = (await trial(app, punky.id, admin)).data!.trial;
    // Both racing heads bind in the punky basswood, so the practice axe leads the verdict.
    expect(detail.ranking[0]!.axeLabel).toBe('Practice 4');
    expect(detail.ranking.slice(1).every((r) => r.flags.includes('BINDS'))).toBe(true);

    // The Grain Map reads published trials only: the seed publishes all but the last of each club.
    const published = await db.getRepository(TrialSummaryEntity).findBy({ trialId: In(list.map((t) => t.id)) });
    expect(published).toHaveLength(6);
    const aspen = await db.getRepository(TrialEntity).find({
      where: { id: In(published.map((p) => p.trialId)), speciesId: 'quaking-aspen', condition: 'GREEN' },
      relations: { testers: true, runs: { axe: true } },
    });
    const inputs = aspen.map(toTrialInput);
    expect(inputs).toHaveLength(2);
    const cells = trialEvidence(inputs);
    expect(cells.map((c) => c.grind).sort()).toEqual(['COMPOUND', 'CONVEX', 'FLAT']);
    // Practice 4 is the reference (left out); Old Blue is the one other flat head, in one trial only.
    expect(cells.find((c) => c.grind === 'FLAT')).toMatchObject({ axeRows: 1, trials: 1, label: 'not-enough-data' });
  });
});
