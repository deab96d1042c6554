import { randomUUID } from 'node:crypto';

import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { errorCode, gql } from '../utils/graphql.js';
import { demoToken, lookupIds, type Ids } from '../utils/meet-operations.js';
import { addAxe, axeInput, updateAxe } from '../utils/rack-operations.js';
import { counted, publishTrialFinding, saveTrial, trial, trialInput, trialSetup } from '../utils/trials-operations.js';
import { createTestApp } from '../utils/test-app.js';

describe('trials: recording, the verdict and publishing (real MariaDB)', () => {
  let app: INestApplication;
  let ids: Ids;
  let coach: string; // Larchmere
  const axes: Record<'ref' | 'chisel' | 'convex', string> = { ref: '', chisel: '', convex: '' };
  let athlete: { id: string; name: string };

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    coach = await demoToken(app, 'coach@example.org');
    const add = async (over: Record<string, unknown>) => (await addAxe(app, coach, ids.clubs.LARCH, axeInput(over))).data!.addAxe.id;
    axes.ref = await add({ grind: 'FLAT', bevelIncludedDeg: 25, chiselWidthMm: null });
    axes.chisel = await add({ grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 });
    axes.convex = await add({ grind: 'CONVEX', bevelIncludedDeg: 17, chiselWidthMm: null });
    athlete = (await trialSetup(app, ids.clubs.LARCH, coach)).data!.trialSetup.athletes[0]!;
  });
  afterAll(async () => {
    await app.close();
  });

  const threeAxes = () => {
    const ana = randomUUID();
    const ben = randomUUID();
    return trialInput(
      ids.clubs.LARCH,
      axes.ref,
      [{ id: ana, athleteId: athlete.id, name: '' }, { id: ben, name: 'Ben Visitor' }],
      [
        { axeId: axes.ref, testerId: ana, swings: [{ depthMm: 18, opening: true }, ...counted(30, 28, 32)], releaseStep: 3, keenness: 'WORKING' },
        { axeId: axes.chisel, testerId: ana, swings: counted(38, 36, 40), releaseStep: 1, keenness: 'KEEN' },
        { axeId: axes.convex, testerId: ana, swings: counted(33, 35, 34), releaseStep: 4, keenness: 'KEEN' },
        { axeId: axes.convex, testerId: ben, swings: counted(36, 38), releaseStep: 5, keenness: 'KEEN' },
      ],
    );
  };

  it('records a trial with three axes and answers the verdict, the tester effect and the sentence', async () => {
    const res = await saveTrial(app, coach, threeAxes());
    expect(res.errors).toBeUndefined();
    const t = res.data!.saveTrial;
    // The roster athlete's name is filled in from the roster.
    expect(t.testers.map((x) => x.name)).toEqual([athlete.name, 'Ben Visitor']);
    // Hand-worked: ref 30, 28, 32 → 30.0 (opening 18 left out); chisel 38, 36, 40 → 38.0 but release 1 binds;
    // convex 33, 35, 34, 36, 38 → 176 ÷ 5 = 35.2, ratio 35.2 ÷ 30 = 1.1733.
    // Verdict: convex 1st, ref 2nd, chisel 3rd (moved after the releasing axes, flagged).
    expect(t.ranking.map((r) => [r.axeId, r.depthPlace, r.verdictPlace])).toEqual([
      [axes.convex, 2, 1],
      [axes.ref, 3, 2],
      [axes.chisel, 1, 3],
    ]);
    expect(t.ranking[0]!.ratioToReference).toBeCloseTo(1.173333, 5);
    expect(t.ranking[2]!.flags).toEqual(['PLACED_AFTER_RELEASING_AXES', 'BINDS']);
    expect(t.leaderLabel).toBe(t.ranking[0]!.axeLabel);
    // Hand-worked: convex, Ben 37.0 vs the athlete 34.0 → 37 ÷ 34 = 1.0882.
    expect(t.testerEffects[0]!.highToLowRatio).toBeCloseTo(1.088235, 5);
    expect(t.recommendation).toMatch(/^For green quaking aspen: 1st .+ \(35\.2 mm a swing, 1\.17× the reference\)/);
    expect(t.recommendation).toContain('cut deeper but binds, so placed after the axes that release.');
    expect(t.runs.find((r) => r.axeId === axes.chisel)!.head).toEqual({ grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 });
    expect(t).toMatchObject({ version: 1, canEdit: true, axeCount: 3, frozenWarning: false });
  });

  it('answers a resend of the same draft with the saved trial instead of a second copy or a conflict', async () => {
    const input = threeAxes();
    const first = (await saveTrial(app, coach, input)).data!.saveTrial;
    const again = await saveTrial(app, coach, input);
    expect(again.errors).toBeUndefined();
    expect(again.data!.saveTrial.version).toBe(first.version);
  });

  it('refuses a save made from an older version, so a second phone cannot silently overwrite', async () => {
    const input = threeAxes();
    await saveTrial(app, coach, input);
    const edited = await saveTrial(app, coach, { ...input, baseVersion: 1, saveToken: randomUUID(), notes: 'second look' });
    expect(edited.data!.saveTrial.version).toBe(2);
    const stale = await saveTrial(app, coach, { ...input, baseVersion: 1, saveToken: randomUUID(), notes: 'from the other phone' });
    expect(errorCode(stale)).toBe('CONFLICT');
  });

  it('builds on a send whose answer was lost, instead of calling the next edit a conflict', async () => {
    const input = threeAxes();
    // The first send lands, but the phone never hears back, so it still thinks it is unsaved.
    await saveTrial(app, coach, input);
    const next = await saveTrial(app, coach, { ...input, saveToken: randomUUID(), unansweredToken: input.saveToken, notes: 'edited offline' });
    expect(next.errors).toBeUndefined();
    expect(next.data!.saveTrial.version).toBe(2);
    // Without the lost token the same edit would be refused.
    expect(errorCode(await saveTrial(app, coach, { ...input, saveToken: randomUUID(), notes: 'no token' }))).toBe('CONFLICT');
  });

  it('keeps the head a run was recorded with after the axe is reground', async () => {
    const input = threeAxes();
    await saveTrial(app, coach, input);
    await updateAxe(app, coach, axes.chisel, axeInput({ grind: 'CHISEL', bevelIncludedDeg: 14, chiselWidthMm: 25.4 }));
    const resaved = (await saveTrial(app, coach, { ...input, baseVersion: 1, saveToken: randomUUID() })).data!.saveTrial;
    expect(resaved.runs.find((r) => r.axeId === axes.chisel)!.head).toMatchObject({ bevelIncludedDeg: 15, chiselWidthMm: 19.05 });
    // A new run on the block takes the setup the rack has now.
    const fresh = (await saveTrial(app, coach, threeAxes())).data!.saveTrial;
    expect(fresh.runs.find((r) => r.axeId === axes.chisel)!.head).toMatchObject({ bevelIncludedDeg: 14, chiselWidthMm: 25.4 });
    await updateAxe(app, coach, axes.chisel, axeInput({ grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 }));
  });

  it('will not put an axe with a loose head on the block', async () => {
    const loose = (await addAxe(app, coach, ids.clubs.LARCH, axeInput({ status: 'HEAD_LOOSE' }))).data!.addAxe;
    const input = threeAxes();
    const runs = [...(input.runs as object[]), { id: randomUUID(), axeId: loose.id, testerId: (input.testers as { id: string }[])[0]!.id, swings: counted(30), feel: '', notes: '' }];
    const res = await saveTrial(app, coach, { ...input, runs });
    expect(res.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'runs.4.axeId' });
    expect(res.errors?.[0]?.message).toContain('head is loose');
    expect((await trialSetup(app, ids.clubs.LARCH, coach)).data!.trialSetup.axes.find((a) => a.id === loose.id)!.usable).toBe(false);
  });

  it('warns of frozen wood when the air is below freezing', async () => {
    const res = await saveTrial(app, coach, { ...threeAxes(), airTempC: -5 });
    expect(res.data!.saveTrial.frozenWarning).toBe(true);
  });

  it('names the field when an axe is not in the club rack', async () => {
    const other = (await addAxe(app, await demoToken(app, 'coach.cedarfork@example.org'), ids.clubs.CFORK, axeInput())).data!.addAxe.id;
    const res = await saveTrial(app, coach, { ...threeAxes(), referenceAxeId: other });
    expect(res.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'referenceAxeId' });
  });

  it('stores a summary and opens a draft Field Note pre-filled with the table and a link back', async () => {
    const t = (await saveTrial(app, coach, threeAxes())).data!.saveTrial;
    const res = await publishTrialFinding(app, coach, t.id);
    expect(res.errors).toBeUndefined();
    const finding = res.data!.publishTrialFinding;
    expect(finding.bodyMarkdown).toContain(`[The trial in Endgrain](/trials/${t.id})`);
    const note = await gql<{ fieldNote: { status: string; kind: string; bodyMarkdown: string; evidence: { kind: string; refId: string }[] } }>(
      app, 'query($s: String!) { fieldNote(slug: $s, draft: true) { status kind bodyMarkdown evidence { kind refId } } }', { s: finding.fieldNoteSlug }, { token: coach });
    expect(note.data!.fieldNote).toMatchObject({ status: 'DRAFT', kind: 'FINDING', evidence: [{ kind: 'TRIAL', refId: t.id }] });
    expect(note.data!.fieldNote.bodyMarkdown).toContain('| Place | Axe | Head on the day |');
    // Publishing again refreshes the summary but keeps the one note.
    const again = (await publishTrialFinding(app, coach, t.id)).data!.publishTrialFinding;
    expect(again.fieldNoteId).toBe(finding.fieldNoteId);
    expect((await trial(app, t.id, coach)).data!.trial.published).toBe(true);
  });
});
