import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { errorCode } from '../utils/graphql.js';
import { waitForMail } from '../utils/mail-sink.js';
import { addAxe, axeInput, logService, updateAxe } from '../utils/rack-operations.js';
import { lookupIds, meetInput, type Ids } from '../utils/meet-operations.js';
import {
  axeResults, correctResult, importSheet, meetChanges, updateMeet, meetResults, meetStandings, publishMeetResults, recordResult, resultAudit, resultsMeet, seasonStandings,
  resultsActors, type ResultsActors,
} from '../utils/results-operations.js';
import { createTestApp } from '../utils/test-app.js';

describe('posting, ranking, correcting and publishing results (real MariaDB)', () => {
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

  it('ranks by official time plus penalty and shares a tied place and its points', async () => {
    const { athletes } = await resultsMeet(app, ids, tokens);
    const [a, b, c, d, e] = athletes.map((x) => x.entryId);
    // Hand-worked on 7-6-5-4-3-2-1: a 40.00 + 2 s = 42.00 ties c (two watches 41.99 and 42.01 average to 42.00)
    // for 1st, splitting 7 + 6 = 6.5 each; b 43.10 is 3rd (5); d scratches (0); e is disqualified (0).
    await recordResult(app, tokens.organiser, { entryId: a, status: 'FINISHED', times: ['40.00'], penaltySeconds: 2, grind: 'CONVEX', bevelIncludedDeg: 32, chiselWidthMm: 6.35, condition: 'SEASONED' });
    await recordResult(app, tokens.organiser, { entryId: b, status: 'FINISHED', times: ['43.10'] });
    await recordResult(app, tokens.organiser, { entryId: c, status: 'FINISHED', times: ['41.99', '42.01'] });
    await recordResult(app, tokens.organiser, { entryId: d, status: 'SCRATCH' });
    const last = await recordResult(app, tokens.organiser, { entryId: e, status: 'DISQUALIFIED', times: ['39.00'], dqReason: 'foot outside the block' });
    expect(last.errors).toBeUndefined();
    const rows = last.data!.recordResult.results;
    expect(rows.map((r) => [r.entryId, r.place, r.points, r.status])).toEqual([
      // Tied rows come in label order; a and c are both 1st.
      ...[[a, 1, 6.5, 'FINISHED'], [c, 1, 6.5, 'FINISHED']].sort((x, y) => labelOf(athletes, x[0] as string).localeCompare(labelOf(athletes, y[0] as string))),
      [b, 3, 5, 'FINISHED'],
      [e, null, 0, 'DISQUALIFIED'],
      [d, null, 0, 'SCRATCH'],
    ]);
    const first = rows.find((r) => r.entryId === a)!;
    expect(first).toMatchObject({ rawTimes: [4000], timeHundredths: 4000, totalHundredths: 4200, grind: 'CONVEX', bevelIncludedDeg: 32, chiselWidthMm: 6.35, condition: 'SEASONED', speciesId: 'eastern-white-pine', diameterMm: 304.8 });
    expect(rows.find((r) => r.entryId === c)).toMatchObject({ rawTimes: [4199, 4201], timeHundredths: 4200 });
  });

  it("fills the head setup from the chosen rack axe and keeps it when the axe is reground", async () => {
    const { meetId, athletes } = await resultsMeet(app, ids, tokens);
    const [first, second, cfork] = [athletes[0]!, athletes[1]!, athletes[3]!];
    const added = (await addAxe(app, tokens.coach, ids.clubs.LARCH, axeInput({ grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 }))).data!.addAxe;
    const res = await recordResult(app, tokens.organiser, { entryId: first.entryId, status: 'FINISHED', times: ['40.00'], axeId: added.id, condition: 'DRY' });
    expect(res.data!.recordResult.results[0]).toMatchObject({ axeLabel: added.label, grind: 'CHISEL', bevelIncludedDeg: 15, chiselWidthMm: 19.05 });

    const regrind = await logService(app, tokens.coach, { axeId: added.id, kind: 'REGRIND', doneOn: new Date().toISOString().slice(0, 10), doneBy: 'Test grinder', setup: { bevelIncludedDeg: 17 } });
    expect(regrind.errors).toBeUndefined();
    // What was measured on the day wins over the rack; the earlier result keeps its snapshot.
    const typed = await recordResult(app, tokens.organiser, { entryId: second.entryId, status: 'FINISHED', times: ['41.00'], axeId: added.id, chiselWidthMm: 12 });
    const rows = typed.data!.recordResult.results;
    expect(rows.find((r) => r.entryId === second.entryId)).toMatchObject({ grind: 'CHISEL', bevelIncludedDeg: 17, chiselWidthMm: 12 });
    expect(rows.find((r) => r.entryId === first.entryId)).toMatchObject({ bevelIncludedDeg: 15, chiselWidthMm: 19.05 });
    const other = await recordResult(app, tokens.organiser, { entryId: cfork.entryId, status: 'FINISHED', times: ['41.00'], axeId: added.id });
    expect(other.errors?.[0]?.extensions).toMatchObject({ field: 'axeId' });

    // A sheet naming the axe by its label links it too.
    const sheet = `event,division,club,athletes,time,axe label\r\nUnderhand chop,Men's,LARCH,${athletes[2]!.name},42.00,${added.label.toLowerCase()}`;
    expect((await importSheet(app, tokens.organiser, meetId, sheet)).body).toMatchObject({ imported: 1 });
    const page = (await meetResults(app, meetId, tokens.organiser)).data!.meetResults.events[0]!.results;
    expect(page.find((r) => r.entryId === athletes[2]!.entryId)).toMatchObject({ axeLabel: added.label, grind: 'CHISEL', bevelIncludedDeg: 17 });
  });

  it('refuses coaches and athletes who try to post a result', async () => {
    const { athletes } = await resultsMeet(app, ids, tokens);
    const input = { entryId: athletes[0]!.entryId, status: 'FINISHED', times: ['40.00'] };
    expect(errorCode(await recordResult(app, tokens.coach, input))).toBe('FORBIDDEN');
    expect(errorCode(await recordResult(app, athlete, input))).toBe('FORBIDDEN');
    expect(errorCode(await correctResult(app, tokens.coach, { ...input, correctionReason: 'my athlete was faster' }))).toBe('FORBIDDEN');
    expect(errorCode(await recordResult(app, undefined, input))).toBe('UNAUTHENTICATED');
  });

  it('names the field of a bad time', async () => {
    const { athletes } = await resultsMeet(app, ids, tokens);
    const res = await recordResult(app, tokens.organiser, { entryId: athletes[0]!.entryId, status: 'FINISHED', times: ['1:5.3'] });
    expect(res.errors?.[0]).toMatchObject({ message: 'Watch 1: "1:5.3" is not m:ss.hh.', extensions: { code: 'BAD_USER_INPUT', field: 'times' } });
  });

  it('keeps results from visitors until published, then e-mails coaches and opens them to everyone', async () => {
    const { meetId, name, athletes } = await resultsMeet(app, ids, tokens);
    for (const [i, x] of athletes.entries()) await recordResult(app, tokens.organiser, { entryId: x.entryId, status: 'FINISHED', times: [`${40 + i}.00`] });
    const before = await meetResults(app, meetId);
    expect(before.data?.meetResults).toMatchObject({ published: false, events: [] });
    expect((await meetResults(app, meetId, tokens.organiser)).data?.meetResults.events[0]?.results).toHaveLength(5);

    const published = await publishMeetResults(app, tokens.organiser, meetId);
    expect(published.data?.publishMeetResults).toMatchObject({ meet: { status: 'PUBLISHED', published: true } });
    expect(published.data!.publishMeetResults.coachesMailed).toBeGreaterThanOrEqual(2);
    const after = await meetResults(app, meetId);
    expect(after.data?.meetResults.events[0]?.results.map((r) => r.place)).toEqual([1, 2, 3, 4, 5]);

    // Hand-worked: Larchmere's athletes ran 40, 41 and 42 s: 1st, 2nd and 3rd.
    const subject = new RegExp(`^Results are out: ${name}$`);
    const mail = await waitForMail('coach@example.org', subject);
    expect(mail.text).toContain(`${athletes[0]!.name}: 1st, 40.00, 7 points`);
    expect(mail.text).toContain('/results/meets/');
    const other = await waitForMail('coach.cedarfork@example.org', subject);
    expect(other.text).toContain(`${athletes[3]!.name}: 4th, 43.00, 4 points`);
  });

  it('refuses to publish while an entry has no result', async () => {
    const { meetId, athletes } = await resultsMeet(app, ids, tokens);
    await recordResult(app, tokens.organiser, { entryId: athletes[0]!.entryId, status: 'FINISHED', times: ['40.00'] });
    const res = await publishMeetResults(app, tokens.organiser, meetId);
    expect(res.errors?.[0]?.message).toBe('4 entries have no result yet; record a scratch for anyone who did not run.');
  });

  it('re-ranks, updates meet and season standings and logs a correction after publishing', async () => {
    const { meetId, athletes } = await resultsMeet(app, ids, tokens);
    // Larchmere 40, 41, 42; Cedar Fork 43, 44 → Larchmere 7+6+5 = 18, Cedar Fork 4+3 = 7 (7-6-5-4-3-2-1).
    for (const [i, x] of athletes.entries()) await recordResult(app, tokens.organiser, { entryId: x.entryId, status: 'FINISHED', times: [`${40 + i}.00`] });
    await publishMeetResults(app, tokens.organiser, meetId);
    const clubs = (await meetStandings(app, meetId)).data!.meetStandings.divisions[0]!.clubs;
    expect(clubs.map((c) => [c.clubId, c.points, c.place])).toEqual([[ids.clubs.LARCH, 18, 1], [ids.clubs.CFORK, 7, 2]]);
    const seasonBefore = (await seasonStandings(app, ids.seasonId, 'MENS')).data!.standings.divisions[0]!.clubs;

    expect(errorCode(await recordResult(app, tokens.organiser, { entryId: athletes[4]!.entryId, status: 'FINISHED', times: ['30.00'] }))).toBe('BAD_USER_INPUT');
    const noReason = await correctResult(app, tokens.organiser, { entryId: athletes[4]!.entryId, status: 'FINISHED', times: ['30.00'], correctionReason: '' });
    expect(noReason.errors?.[0]?.extensions?.field).toBe('correctionReason');
    // The timekeeper misread a watch: Cedar Fork's second man ran 39.00, now 1st.
    const fixed = await correctResult(app, tokens.organiser, { entryId: athletes[4]!.entryId, status: 'FINISHED', times: ['39.00'], correctionReason: 'watch 1 misread at the block' });
    expect(fixed.errors).toBeUndefined();
    expect(fixed.data!.correctResult.results.map((r) => [r.entryId, r.place])).toEqual([4, 0, 1, 2, 3].map((i, place) => [athletes[i]!.entryId, place + 1]));

    // Hand-worked: Larchmere 6+5+4 = 15; Cedar Fork 7+3 = 10.
    const after = (await meetStandings(app, meetId)).data!.meetStandings.divisions[0]!.clubs;
    expect(after.map((c) => [c.clubId, c.points])).toEqual([[ids.clubs.LARCH, 15], [ids.clubs.CFORK, 10]]);
    const seasonAfter = (await seasonStandings(app, ids.seasonId, 'MENS')).data!.standings.divisions[0]!.clubs;
    const points = (rows: typeof seasonAfter, clubId: string): number => rows.find((c) => c.clubId === clubId)?.points ?? 0;
    expect(points(seasonAfter, ids.clubs.LARCH) - points(seasonBefore, ids.clubs.LARCH)).toBeCloseTo(-3, 2);
    expect(points(seasonAfter, ids.clubs.CFORK) - points(seasonBefore, ids.clubs.CFORK)).toBeCloseTo(3, 2);

    const audit = (await resultAudit(app, tokens.organiser, meetId)).data!.resultAudit;
    expect(audit[0]).toMatchObject({ action: 'CORRECTED', reason: 'watch 1 misread at the block', byName: 'Meet Organiser (demo)' });
    expect(JSON.parse(audit[0]!.before!)).toMatchObject({ rawTimes: [4400], place: 5, points: 3 });
    expect(JSON.parse(audit[0]!.after)).toMatchObject({ rawTimes: [3900], place: 1, points: 7 });
    expect(audit).toHaveLength(6);
    expect(errorCode(await resultAudit(app, tokens.coach, meetId))).toBe('FORBIDDEN');
  });

  it("lists an axe's published results with the head each was chopped with, to whoever may see the axe", async () => {
    const { meetId, athletes } = await resultsMeet(app, ids, tokens);
    const added = (await addAxe(app, tokens.coach, ids.clubs.LARCH, axeInput({ grind: 'CONVEX', bevelIncludedDeg: 30, chiselWidthMm: null }))).data!.addAxe;
    for (const [i, x] of athletes.entries()) {
      await recordResult(app, tokens.organiser, { entryId: x.entryId, status: 'FINISHED', times: [`${40 + i}.00`], ...(i === 0 ? { axeId: added.id } : {}) });
    }
    // Not published yet: nothing to show, even to the club.
    expect((await axeResults(app, added.id, tokens.coach)).data?.axeResults).toEqual([]);
    await publishMeetResults(app, tokens.organiser, meetId);
    await logService(app, tokens.coach, { axeId: added.id, kind: 'REGRIND', doneOn: new Date().toISOString().slice(0, 10), doneBy: 'Test grinder', setup: { bevelIncludedDeg: 34 } });

    const listed = (await axeResults(app, added.id, tokens.athlete)).data!.axeResults;
    // The result keeps the 30° it was chopped with, not the 34° of the later regrind.
    expect(listed.map((r) => [r.meetId, r.entryId, r.totalHundredths, r.place, r.bevelIncludedDeg])).toEqual([[meetId, athletes[0]!.entryId, 4000, 1, 30]]);
    // A private axe is not found outside its club; once public, anyone may read its results.
    expect(errorCode(await axeResults(app, added.id, tokens.otherCoach))).toBe('NOT_FOUND');
    expect(errorCode(await axeResults(app, added.id))).toBe('NOT_FOUND');
    expect((await updateAxe(app, tokens.coach, added.id, axeInput({ label: added.label, grind: 'CONVEX', bevelIncludedDeg: 34, chiselWidthMm: null, isPublic: true }))).errors).toBeUndefined();
    expect((await axeResults(app, added.id)).data!.axeResults).toHaveLength(1);
  });

  it("re-ranks a published meet when its scoring changes, only with a reason, and keeps the change on record", async () => {
    const { meetId, name, athletes } = await resultsMeet(app, ids, tokens);
    for (const [i, x] of athletes.entries()) await recordResult(app, tokens.organiser, { entryId: x.entryId, status: 'FINISHED', times: [`${40 + i}.00`] });
    await publishMeetResults(app, tokens.organiser, meetId);
    const totals = async () => Object.fromEntries((await meetStandings(app, meetId)).data!.meetStandings.divisions[0]!.clubs.map((c) => [c.clubId, c.points]));
    // Hand-worked on 7-6-5-4-3-2-1: Larchmere ran 1st to 3rd (7 + 6 + 5 = 18), Cedar Fork 4th and 5th (4 + 3 = 7).
    expect(await totals()).toEqual({ [ids.clubs.LARCH]: 18, [ids.clubs.CFORK]: 7 });

    const input = meetInput(ids, { name, pointsTable: [5, 4, 3, 2, 1, 0] });
    const refused = await updateMeet(app, tokens.organiser, meetId, input);
    expect(refused.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'reason' });
    expect(await totals()).toEqual({ [ids.clubs.LARCH]: 18, [ids.clubs.CFORK]: 7 });

    expect((await updateMeet(app, tokens.organiser, meetId, { ...input, reason: 'sanctioning table for this season' })).errors).toBeUndefined();
    // On 5-4-3-2-1-0: Larchmere 5 + 4 + 3 = 12, Cedar Fork 2 + 1 = 3.
    expect(await totals()).toEqual({ [ids.clubs.LARCH]: 12, [ids.clubs.CFORK]: 3 });
    const page = (await meetResults(app, meetId)).data!.meetResults.events[0]!.results;
    expect(page.map((r) => r.points)).toEqual([5, 4, 3, 2, 1]);
    const changes = (await meetChanges(app, tokens.organiser, meetId)).data!.meetChanges;
    expect(changes[0]).toMatchObject({ summary: 'Scoring changed: sanctioning table for this season', byName: 'Meet Organiser (demo)' });
    expect(JSON.parse(changes[0]!.before)).toMatchObject({ pointsTable: [7, 6, 5, 4, 3, 2, 1] });
    const audit = (await resultAudit(app, tokens.organiser, meetId)).data!.resultAudit.filter((a) => a.reason === 'Scoring changed: sanctioning table for this season');
    expect(audit).toHaveLength(5);
    expect(errorCode(await meetChanges(app, tokens.coach, meetId))).toBe('FORBIDDEN');
  });

  it('states the season tie-break', async () => {
    const res = await seasonStandings(app, ids.seasonId);
    expect(res.data?.standings.tieBreak).toMatch(/^Clubs level on season points are separated by the most event first places/);
  });
});

function labelOf(athletes: { name: string; entryId: string }[], entryId: string): string {
  return athletes.find((a) => a.entryId === entryId)!.name;
}
