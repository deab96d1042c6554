import { describe, expect, it } from '@jest/globals';

import { errorCode } from '../utils/graphql.js';
import { addAxe, axe, axeInput, logService, rack, updateAxe, useRackApp } from '../utils/rack-operations.js';

const MM_PER_INCH = 25.4; // exact by definition (NIST SP 811, App. B.8)
const today = (): string => new Date().toISOString().slice(0, 10);

describe('the rack: axes, visibility and the service log (real MariaDB)', () => {
  const ctx = useRackApp();
  const larchmereAxe = async (over: Record<string, unknown> = {}) => {
    const res = await addAxe(ctx.app, ctx.coach, ctx.ids.clubs.LARCH, axeInput(over));
    expect(res.errors).toBeUndefined();
    return res.data!.addAxe;
  };


  it('stores an axe in SI units and shows included and per-side angles with the shoulder thickness', async () => {
    const added = await larchmereAxe({ bevelIncludedDeg: 15, chiselWidthMm: 0.75 * MM_PER_INCH });
    // Hand-worked: per-side = 15° ÷ 2 = 7.5°; shoulder = 2 × 19.05 mm × tan 7.5° = 38.1 × 0.1316525 = 5.016 mm (0.19748 in).
    expect(added.geometry).toEqual({ includedAngleDeg: 15, perSideAngleDeg: 7.5, chiselWidthMm: 19.05, shoulderThicknessMm: 5.016 });
    expect(added.headWeightG).toBe(2495);
    expect(added.canManage).toBe(true);
  });

  it("hides another club's private axe from its coach: not in the rack, not readable, not editable", async () => {
    const priv = await larchmereAxe();
    const listed = await rack(ctx.app, ctx.ids.clubs.LARCH, { token: ctx.otherCoach });
    expect(listed.data?.rack.isMember).toBe(false);
    expect(listed.data?.rack.axes.map((a) => a.id)).not.toContain(priv.id);
    expect(errorCode(await axe(ctx.app, priv.id, ctx.otherCoach))).toBe('NOT_FOUND');
    expect(errorCode(await updateAxe(ctx.app, ctx.otherCoach, priv.id, axeInput({ label: 'Taken' })))).toBe('NOT_FOUND');
    expect(errorCode(await logService(ctx.app, ctx.otherCoach, { axeId: priv.id, kind: 'HONE', doneOn: today() }))).toBe('NOT_FOUND');
    // And the axe is untouched.
    expect((await axe(ctx.app, priv.id, ctx.coach)).data?.axe.services).toEqual([]);
  });

  it("lets anyone read an axe the club made public, but only the club's coach edit it", async () => {
    const pub = await larchmereAxe({ isPublic: true });
    expect((await axe(ctx.app, pub.id, ctx.otherCoach)).data?.axe.canManage).toBe(false);
    expect((await rack(ctx.app, ctx.ids.clubs.LARCH)).data?.rack.axes.map((a) => a.id)).toContain(pub.id);
    expect(errorCode(await updateAxe(ctx.app, ctx.otherCoach, pub.id, axeInput({ isPublic: true })))).toBe('FORBIDDEN');
  });

  it('shows the whole rack to the club\'s athletes but lets only coaches change it', async () => {
    const priv = await larchmereAxe();
    const seen = await rack(ctx.app, ctx.ids.clubs.LARCH, { token: ctx.athlete });
    expect(seen.data?.rack).toMatchObject({ isMember: true, canManage: false });
    expect(seen.data?.rack.axes.map((a) => a.id)).toContain(priv.id);
    expect(errorCode(await addAxe(ctx.app, ctx.athlete, ctx.ids.clubs.LARCH, axeInput()))).toBe('FORBIDDEN');
  });

  it("refuses a coach who adds an axe to another club's rack", async () => {
    expect(errorCode(await addAxe(ctx.app, ctx.otherCoach, ctx.ids.clubs.LARCH, axeInput()))).toBe('FORBIDDEN');
  });

  it('names the field of each setup mistake', async () => {
    const field = async (over: Record<string, unknown>) => (await addAxe(ctx.app, ctx.coach, ctx.ids.clubs.LARCH, axeInput(over))).errors?.[0]?.extensions?.field;
    expect(await field({ grind: 'FLAT', chiselWidthMm: 12.7 })).toBe('chiselWidthMm');
    expect(await field({ bevelIncludedDeg: 90 })).toBe('bevelIncludedDeg');
    // 30 in typed into the millimetre box: 30 mm is below the 150 mm (5.91 in) bound.
    expect(await field({ handleLengthMm: 30 })).toBe('handleLengthMm');
    const first = await larchmereAxe();
    expect(await field({ label: first.label })).toBe('label');
  });

  it('logs a regrind that becomes the current setup while the old setup stays in the history', async () => {
    const dull = await larchmereAxe({ status: 'NEEDS_EDGE', bevelIncludedDeg: 15 });
    const res = await logService(ctx.app, ctx.coach, {
      axeId: dull.id,
      kind: 'REGRIND',
      doneOn: today(),
      doneBy: 'Hale Dunmore',
      notes: 'Opened the bevel for the frozen-season pine',
      setup: { bevelIncludedDeg: 16, status: 'READY' },
    });
    expect(res.errors).toBeUndefined();
    const after = res.data!.logAxeService;
    expect(after.status).toBe('READY');
    // Hand-worked: 16° included → 8° per side.
    expect(after.geometry).toMatchObject({ includedAngleDeg: 16, perSideAngleDeg: 8 });
    expect(after.lastServicedOn).toBe(today());
    expect(after.services[0]).toMatchObject({ kind: 'REGRIND', doneBy: 'Hale Dunmore' });
    expect(after.services[0]!.changes).toEqual([
      { field: 'bevelIncludedDeg', before: '15', after: '16' },
      { field: 'status', before: 'NEEDS_EDGE', after: 'READY' },
    ]);
  });

  it('refuses a back-dated setup change that would overwrite a newer one', async () => {
    const a = await larchmereAxe();
    expect((await logService(ctx.app, ctx.coach, { axeId: a.id, kind: 'REGRIND', doneOn: today(), setup: { bevelIncludedDeg: 17 } })).errors).toBeUndefined();
    const res = await logService(ctx.app, ctx.coach, { axeId: a.id, kind: 'REGRIND', doneOn: '2020-01-01', setup: { bevelIncludedDeg: 14 } });
    expect(res.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'doneOn' });
    expect((await axe(ctx.app, a.id, ctx.coach)).data?.axe.geometry.includedAngleDeg).toBe(17);
  });

  it('retires an axe through the log and writes direct setup edits to the log as corrections', async () => {
    const a = await larchmereAxe({ bitWidthMm: 130 });
    const edited = await updateAxe(ctx.app, ctx.coach, a.id, axeInput({ label: a.label, bitWidthMm: 127 }));
    expect(edited.data?.updateAxe.services[0]).toMatchObject({ kind: 'SETUP_CORRECTED', changes: [{ field: 'bitWidthMm', before: '130', after: '127' }] });
    const retired = await logService(ctx.app, ctx.coach, { axeId: a.id, kind: 'RETIRE', doneOn: today(), notes: 'Crack at the eye' });
    expect(retired.data?.logAxeService.status).toBe('RETIRED');
  });

  it('filters the rack by status, grind and who may use it', async () => {
    const edge = await larchmereAxe({ status: 'NEEDS_EDGE', grind: 'CONVEX', chiselWidthMm: null, allowedFor: 'EXPERIENCED_ONLY' });
    const byStatus = await rack(ctx.app, ctx.ids.clubs.LARCH, { token: ctx.coach, filter: { statuses: ['NEEDS_EDGE'] } });
    expect(byStatus.data?.rack.axes.every((a) => a.status === 'NEEDS_EDGE')).toBe(true);
    expect(byStatus.data?.rack.axes.map((a) => a.id)).toContain(edge.id);
    const byGrindAndUse = await rack(ctx.app, ctx.ids.clubs.LARCH, { token: ctx.coach, filter: { grinds: ['CONVEX'], allowedFor: ['EXPERIENCED_ONLY'] } });
    expect(byGrindAndUse.data?.rack.axes.every((a) => a.grind === 'CONVEX' && a.allowedFor === 'EXPERIENCED_ONLY')).toBe(true);
    expect(byGrindAndUse.data?.rack.axes.map((a) => a.id)).toContain(edge.id);
  });
});
