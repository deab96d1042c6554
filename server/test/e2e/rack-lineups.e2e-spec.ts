import { beforeAll, describe, expect, it } from '@jest/globals';

import { errorCode } from '../utils/graphql.js';
import { addAthlete, addMeetEvent, createMeet, drawOrder, enter, meetInput, setMeetStatus } from '../utils/meet-operations.js';
import { addAxe, assignLineup, axeInput, clearLineupAssignment, lineup, lineupOverrides, useRackApp } from '../utils/rack-operations.js';
import { recordResult } from '../utils/results-operations.js';

let n = 0;
const unique = (): string => `${process.pid}${Date.now().toString(36)}${++n}`;
type Level = 'ROOKIE' | 'DEVELOPING' | 'EXPERIENCED';

// Rules under test are the product's own (the Rack issue): see lineup-rules.spec.ts.
describe('lineups: athletes and axes for a meet (real MariaDB)', () => {
  const ctx = useRackApp();
  let meetId: string;
  let chopId: string;
  let sawId: string;

  const athlete = async (experience: Level, lastName = `L${unique()}`) => {
    const res = await addAthlete(ctx.app, ctx.coach, { clubId: ctx.ids.clubs.LARCH, firstName: 'Test', lastName, divisions: ['MENS'], experience });
    return res.data!.addAthlete;
  };
  const entryFor = async (athleteId: string, eventId = chopId) => (await enter(ctx.app, ctx.coach, eventId, ctx.ids.clubs.LARCH, [athleteId])).data!.enterMeetEvent.id;
  const axeWith = async (over: Record<string, unknown>) => (await addAxe(ctx.app, ctx.coach, ctx.ids.clubs.LARCH, axeInput(over))).data!.addAxe;
  const refusal = (res: { errors?: { message: string; extensions?: { code?: string; field?: string } }[] }) => ({
    code: res.errors?.[0]?.extensions?.code,
    field: res.errors?.[0]?.extensions?.field,
    message: res.errors?.[0]?.message,
  });

  beforeAll(async () => {
    meetId = (await createMeet(ctx.app, ctx.organiser, meetInput(ctx.ids))).data!.createMeet.id;
    chopId = (await addMeetEvent(ctx.app, ctx.organiser, meetId, { eventTypeId: ctx.ids.eventTypes['underhand-chop'], division: 'MENS', speciesId: 'eastern-white-pine', diameterMm: 304.8 })).data!.addMeetEvent.id;
    sawId = (await addMeetEvent(ctx.app, ctx.organiser, meetId, { eventTypeId: ctx.ids.eventTypes['single-buck'], division: 'MENS', speciesId: 'eastern-white-pine' })).data!.addMeetEvent.id;
    expect((await setMeetStatus(ctx.app, ctx.organiser, meetId, 'OPEN')).data?.setMeetStatus.status).toBe('OPEN');
  });

  it.each([
    ['HEAD_LOOSE', 'has a loose head'],
    ['NEEDS_HANDLE', 'needs a new handle'],
    ['RETIRED', 'is retired'],
  ] as const)('refuses an axe whose status is %s', async (status, words) => {
    const entryId = await entryFor((await athlete('EXPERIENCED')).id);
    const a = await axeWith({ status });
    const res = await assignLineup(ctx.app, ctx.coach, { entryId, axeId: a.id });
    expect(refusal(res)).toEqual({ code: 'BAD_USER_INPUT', field: 'axeId', message: expect.stringContaining(`${a.label} ${words}`) });
  });

  it('accepts an axe that needs an edge, with a warning', async () => {
    const entryId = await entryFor((await athlete('EXPERIENCED')).id);
    const a = await axeWith({ status: 'NEEDS_EDGE' });
    const res = await assignLineup(ctx.app, ctx.coach, { entryId, axeId: a.id });
    expect(res.errors).toBeUndefined();
    expect(res.data?.assignLineup.warnings).toEqual([`${a.label} needs an edge: regrind or hone it before the meet, or pick another axe.`]);
  });

  it.each(['ROOKIE', 'DEVELOPING'] as const)('refuses an experienced-only axe to a %s athlete without an override reason', async (level) => {
    const person = await athlete(level);
    const entryId = await entryFor(person.id);
    const a = await axeWith({ allowedFor: 'EXPERIENCED_ONLY' });
    const res = await assignLineup(ctx.app, ctx.coach, { entryId, axeId: a.id });
    const who = level === 'ROOKIE' ? 'a rookie' : 'a developing athlete';
    expect(refusal(res)).toEqual({
      code: 'BAD_USER_INPUT',
      field: 'overrideReason',
      message: expect.stringContaining(`${a.label} is for experienced athletes only; ${person.name} is ${who}.`),
    });
  });

  it('records an override with its reason, who gave it and the athlete it was for', async () => {
    const rookie = await athlete('ROOKIE');
    const entryId = await entryFor(rookie.id);
    const a = await axeWith({ allowedFor: 'EXPERIENCED_ONLY' });
    const reason = 'Swung this axe under supervision all autumn';
    const res = await assignLineup(ctx.app, ctx.coach, { entryId, axeId: a.id, overrideReason: reason });
    expect(res.errors).toBeUndefined();
    expect(res.data?.assignLineup.warnings).toEqual([expect.stringContaining(`Override recorded: "${reason}"`)]);
    expect(res.data?.assignLineup.assignment.override).toMatchObject({ reason, byName: 'Club Coach (demo)' });
    const record = await lineupOverrides(ctx.app, ctx.coach, meetId, ctx.ids.clubs.LARCH);
    expect(record.data?.lineupOverrides).toContainEqual({
      entryId,
      athleteName: rookie.name,
      athleteExperience: 'ROOKIE',
      axeLabel: a.label,
      axeAllowedFor: 'EXPERIENCED_ONLY',
      reason,
      byName: 'Club Coach (demo)',
    });
    // The record survives the assignment being cleared.
    expect((await clearLineupAssignment(ctx.app, ctx.coach, entryId)).data?.clearLineupAssignment).toBe(true);
    expect((await lineupOverrides(ctx.app, ctx.coach, meetId, ctx.ids.clubs.LARCH)).data?.lineupOverrides.map((o) => o.entryId)).toContain(entryId);
  });

  it('warns when one axe goes to two athletes in the same heat', async () => {
    const heatMeet = (await createMeet(ctx.app, ctx.organiser, meetInput(ctx.ids))).data!.createMeet.id;
    const event = (await addMeetEvent(ctx.app, ctx.organiser, heatMeet, { eventTypeId: ctx.ids.eventTypes['standing-block-chop'], division: 'MENS', speciesId: 'eastern-white-pine', diameterMm: 304.8 })).data!.addMeetEvent.id;
    await setMeetStatus(ctx.app, ctx.organiser, heatMeet, 'OPEN');
    const [first, second] = [await athlete('EXPERIENCED'), await athlete('EXPERIENCED')];
    const e1 = await entryFor(first.id, event);
    const e2 = await entryFor(second.id, event);
    const drawn = await drawOrder(ctx.app, ctx.organiser, event, 4, 7);
    expect(drawn.data?.drawOrder.entries.map((e) => e.heat)).toEqual([1, 1]); // two entries, heats of four: one heat
    const a = await axeWith({});
    expect((await assignLineup(ctx.app, ctx.coach, { entryId: e1, axeId: a.id })).data?.assignLineup.warnings).toEqual([]);
    const res = await assignLineup(ctx.app, ctx.coach, { entryId: e2, axeId: a.id });
    expect(res.data?.assignLineup.warnings).toEqual([`${a.label} is also given to ${first.name} in the same heat; one axe cannot be swung by two athletes at once.`]);
    const sheet = await lineup(ctx.app, ctx.coach, heatMeet, ctx.ids.clubs.LARCH);
    expect(sheet.data?.lineup.entries.every((e) => e.warnings.some((w) => w.includes('same heat')))).toBe(true);
  });

  it('refuses an axe on an event chopped without a head', async () => {
    const entryId = await entryFor((await athlete('EXPERIENCED')).id, sawId);
    const res = await assignLineup(ctx.app, ctx.coach, { entryId, axeId: (await axeWith({})).id });
    expect(refusal(res)).toMatchObject({ code: 'BAD_USER_INPUT', field: 'axeId', message: expect.stringContaining('Single buck is not chopped with an axe head') });
  });

  it("keeps other clubs out of a club's lineup and its axes out of theirs", async () => {
    const entryId = await entryFor((await athlete('EXPERIENCED')).id);
    const a = await axeWith({});
    expect(errorCode(await assignLineup(ctx.app, ctx.otherCoach, { entryId, axeId: a.id }))).toBe('FORBIDDEN');
    expect(errorCode(await lineup(ctx.app, ctx.otherCoach, meetId, ctx.ids.clubs.LARCH))).toBe('FORBIDDEN');
    expect(errorCode(await lineupOverrides(ctx.app, ctx.athlete, meetId, ctx.ids.clubs.LARCH))).toBe('FORBIDDEN');
    const theirAthlete = (await addAthlete(ctx.app, ctx.otherCoach, { clubId: ctx.ids.clubs.CFORK, firstName: 'Test', lastName: `C${unique()}`, divisions: ['MENS'], experience: 'EXPERIENCED' })).data!.addAthlete;
    const theirEntry = (await enter(ctx.app, ctx.otherCoach, chopId, ctx.ids.clubs.CFORK, [theirAthlete.id])).data!.enterMeetEvent.id;
    expect(refusal(await assignLineup(ctx.app, ctx.otherCoach, { entryId: theirEntry, axeId: a.id }))).toMatchObject({ field: 'axeId' });
  });

  it("shows the club's athletes their lineup, read-only", async () => {
    const entryId = await entryFor((await athlete('EXPERIENCED')).id);
    await assignLineup(ctx.app, ctx.coach, { entryId, axeId: (await axeWith({})).id });
    const seen = await lineup(ctx.app, ctx.athlete, meetId, ctx.ids.clubs.LARCH);
    expect(seen.data?.lineup.canManage).toBe(false);
    expect(seen.data?.lineup.entries.find((e) => e.entryId === entryId)?.assignment?.axeLabel).toBeTruthy();
    expect(errorCode(await assignLineup(ctx.app, ctx.athlete, { entryId }))).toBe('FORBIDDEN');
  });
  it('fills the head of a result posted for a lineup entry from the axe assigned to it', async () => {
    const entryId = await entryFor((await athlete('EXPERIENCED')).id);
    const a = await axeWith({ grind: 'COMPOUND', bevelIncludedDeg: 16, chiselWidthMm: 12.7 });
    expect((await assignLineup(ctx.app, ctx.coach, { entryId, axeId: a.id })).errors).toBeUndefined();
    await setMeetStatus(ctx.app, ctx.organiser, meetId, 'CLOSED');
    await setMeetStatus(ctx.app, ctx.organiser, meetId, 'RUNNING');
    const res = await recordResult(ctx.app, ctx.organiser, { entryId, status: 'FINISHED', times: ['41.20'] });
    expect(res.errors).toBeUndefined();
    const posted = res.data!.recordResult.results.find((r) => r.entryId === entryId);
    expect(posted).toMatchObject({ axeLabel: a.label, grind: 'COMPOUND', bevelIncludedDeg: 16, chiselWidthMm: 12.7 });
  });
});
