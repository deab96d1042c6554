import { randomUUID } from 'node:crypto';

import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { errorCode } from '../utils/graphql.js';
import { demoToken, lookupIds, type Ids } from '../utils/meet-operations.js';
import { addAxe, axeInput } from '../utils/rack-operations.js';
import { axeTrials, counted, deleteTrial, publishTrialFinding, saveTrial, trial, trialInput, trials, trialSetup } from '../utils/trials-operations.js';
import { createTestApp } from '../utils/test-app.js';

describe("trials are the club's own: coaches record, athletes read, other clubs are refused", () => {
  let app: INestApplication;
  let ids: Ids;
  let coach: string; // Larchmere
  let athlete: string; // Larchmere
  let otherCoach: string; // Cedar Fork
  let organiser: string;
  let trialId: string;
  let axeId: string;
  let input: Record<string, unknown>;

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    [coach, athlete, otherCoach, organiser] = await Promise.all([
      demoToken(app, 'coach@example.org'),
      demoToken(app, 'athlete@example.org'),
      demoToken(app, 'coach.cedarfork@example.org'),
      demoToken(app, 'organiser@example.org'),
    ]);
    axeId = (await addAxe(app, coach, ids.clubs.LARCH, axeInput({ isPublic: true }))).data!.addAxe.id;
    const tester = randomUUID();
    input = trialInput(ids.clubs.LARCH, axeId, [{ id: tester, name: 'Wren Oakhurst' }], [{ axeId, testerId: tester, swings: counted(30, 31, 29), releaseStep: 3 }]);
    const saved = await saveTrial(app, coach, input);
    expect(saved.errors).toBeUndefined();
    trialId = saved.data!.saveTrial.id;
  });
  afterAll(async () => {
    await app.close();
  });

  it("lets the club's athletes read its trials but not record, edit, publish or delete them", async () => {
    expect((await trial(app, trialId, athlete)).data!.trial.canEdit).toBe(false);
    const list = (await trials(app, ids.clubs.LARCH, athlete)).data!.trials;
    expect(list.canRecord).toBe(false);
    expect(list.trials.map((t) => t.id)).toContain(trialId);
    expect((await axeTrials(app, axeId, athlete)).data!.axeTrials.map((t) => t.trialId)).toContain(trialId);
    expect(errorCode(await saveTrial(app, athlete, { ...input, id: randomUUID(), saveToken: randomUUID() }))).toBe('FORBIDDEN');
    expect(errorCode(await saveTrial(app, athlete, { ...input, baseVersion: 1, saveToken: randomUUID() }))).toBe('FORBIDDEN');
    expect(errorCode(await deleteTrial(app, athlete, trialId))).toBe('FORBIDDEN');
    expect(errorCode(await publishTrialFinding(app, athlete, trialId))).toBe('FORBIDDEN');
    expect(errorCode(await trialSetup(app, ids.clubs.LARCH, athlete))).toBe('FORBIDDEN');
  });

  it("refuses another club's coach every way in, without telling them the trial exists", async () => {
    expect(errorCode(await trial(app, trialId, otherCoach))).toBe('NOT_FOUND');
    expect(errorCode(await trials(app, ids.clubs.LARCH, otherCoach))).toBe('FORBIDDEN');
    expect(errorCode(await saveTrial(app, otherCoach, { ...input, baseVersion: 1, saveToken: randomUUID() }))).toBe('FORBIDDEN');
    // Reusing the id under their own club does not reach it either.
    expect(errorCode(await saveTrial(app, otherCoach, { ...input, clubId: ids.clubs.CFORK, baseVersion: 1, saveToken: randomUUID() }))).toBe('NOT_FOUND');
    expect(errorCode(await deleteTrial(app, otherCoach, trialId))).toBe('NOT_FOUND');
    expect(errorCode(await publishTrialFinding(app, otherCoach, trialId))).toBe('NOT_FOUND');
    expect(errorCode(await trialSetup(app, ids.clubs.LARCH, otherCoach))).toBe('FORBIDDEN');
    // The axe is public, but its trials stay with the club.
    expect(errorCode(await axeTrials(app, axeId, otherCoach))).toBe('FORBIDDEN');
    // And the trial is untouched.
    expect((await trial(app, trialId, coach)).data!.trial.version).toBe(1);
  });

  it('keeps trials from organisers and visitors who are not members', async () => {
    expect(errorCode(await trials(app, ids.clubs.LARCH, organiser))).toBe('FORBIDDEN');
    expect(errorCode(await trial(app, trialId))).toBe('UNAUTHENTICATED');
    expect(errorCode(await saveTrial(app, organiser, { ...input, id: randomUUID(), saveToken: randomUUID() }))).toBe('FORBIDDEN');
  });

  it("lets the club's coach delete a trial", async () => {
    const extra = (await saveTrial(app, coach, { ...input, id: randomUUID(), saveToken: randomUUID() })).data!.saveTrial.id;
    expect((await deleteTrial(app, coach, extra)).data!.deleteTrial).toBe(true);
    expect(errorCode(await trial(app, extra, coach))).toBe('NOT_FOUND');
  });
});
