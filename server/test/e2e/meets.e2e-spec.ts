import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { errorCode, gql } from '../utils/graphql.js';
import {
  addAthlete, addMeetEvent, createMeet, demoToken, drawOrder, enter, lookupIds, meet, meetInput, setMeetStatus, type Ids,
} from '../utils/meet-operations.js';
import { createTestApp } from '../utils/test-app.js';

let n = 0;
const unique = (): string => `${process.pid}${Date.now().toString(36)}${++n}`;

describe('meets, events and entries (real MariaDB)', () => {
  let app: INestApplication;
  let ids: Ids;
  let organiser: string;
  let coach: string; // Larchmere
  let otherCoach: string; // Cedar Fork
  let athlete: string;

  const woman = (clubId: string, token = coach, over: Record<string, unknown> = {}) =>
    addAthlete(app, token, { clubId, firstName: 'Test', lastName: `W${unique()}`, divisions: ['WOMENS', 'MIXED'], experience: 'DEVELOPING', ...over }).then((r) => r.data!.addAthlete);
  const man = (clubId: string, token = coach) =>
    addAthlete(app, token, { clubId, firstName: 'Test', lastName: `M${unique()}`, divisions: ['MENS', 'MIXED'], experience: 'ROOKIE' }).then((r) => r.data!.addAthlete);

  /** An open meet with an underhand chop (men) and a mixed double buck. */
  async function openMeet(over: Record<string, unknown> = {}) {
    const created = await createMeet(app, organiser, meetInput(ids, over));
    expect(created.errors).toBeUndefined();
    const meetId = created.data!.createMeet.id;
    const chop = await addMeetEvent(app, organiser, meetId, { eventTypeId: ids.eventTypes['underhand-chop'], division: 'MENS', speciesId: 'eastern-white-pine', diameterMm: 304.8 });
    const buck = await addMeetEvent(app, organiser, meetId, { eventTypeId: ids.eventTypes['mixed-double-buck'], division: 'MIXED', speciesId: 'eastern-white-pine' });
    expect((await setMeetStatus(app, organiser, meetId, 'OPEN')).data?.setMeetStatus.status).toBe('OPEN');
    return { meetId, chopId: chop.data!.addMeetEvent.id, buckId: buck.data!.addMeetEvent.id };
  }

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    [organiser, coach, otherCoach, athlete] = await Promise.all([
      demoToken(app, 'organiser@example.org'),
      demoToken(app, 'coach@example.org'),
      demoToken(app, 'coach.cedarfork@example.org'),
      demoToken(app, 'athlete@example.org'),
    ]);
  });
  afterAll(async () => {
    await app.close();
  });

  it('lets an organiser build a meet with two events and open it', async () => {
    const { meetId } = await openMeet();
    const res = await meet(app, meetId);
    expect(res.data?.meet.status).toBe('OPEN');
    expect(res.data?.meet.events).toHaveLength(2);
  });

  it('refuses an athlete and a coach who try to create a meet', async () => {
    expect(errorCode(await createMeet(app, athlete, meetInput(ids)))).toBe('FORBIDDEN');
    expect(errorCode(await createMeet(app, coach, meetInput(ids)))).toBe('FORBIDDEN');
  });

  it('names the field when a fixed table has no points', async () => {
    const res = await createMeet(app, organiser, meetInput(ids, { pointsTable: [] }));
    expect(res.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'pointsTable' });
  });

  it('keeps a draft meet away from signed-out visitors', async () => {
    const created = await createMeet(app, organiser, meetInput(ids));
    expect(errorCode(await meet(app, created.data!.createMeet.id))).toBe('NOT_FOUND');
    expect(errorCode(await meet(app, created.data!.createMeet.id, organiser))).toBeNull();
  });

  it("stops a coach from touching another club's roster", async () => {
    const res = await addAthlete(app, otherCoach, { clubId: ids.clubs.LARCH, firstName: 'Sneaky', lastName: 'Add', divisions: ['MENS'], experience: 'ROOKIE' });
    expect(errorCode(res)).toBe('FORBIDDEN');
    const mine = await man(ids.clubs.LARCH);
    const edit = await gql(app, 'mutation($id: ID!, $i: AthleteInput!) { updateAthlete(id: $id, input: $i) { id } }', {
      id: mine.id, i: { clubId: ids.clubs.LARCH, firstName: 'Changed', lastName: 'Name', divisions: ['MENS'], experience: 'ROOKIE' },
    }, { token: otherCoach });
    expect(errorCode(edit)).toBe('FORBIDDEN');
  });

  it("stops a coach from entering another club's athletes or entering for another club", async () => {
    const { chopId } = await openMeet();
    const larchMan = await man(ids.clubs.LARCH);
    expect(errorCode(await enter(app, otherCoach, chopId, ids.clubs.LARCH, [larchMan.id]))).toBe('FORBIDDEN');
    const res = await enter(app, otherCoach, chopId, ids.clubs.CFORK, [larchMan.id]);
    expect(res.errors?.[0]?.message).toBe(`${larchMan.name} is not on this club's roster.`);
  });

  it('enters a pair and shows it on the meet page', async () => {
    const { meetId, buckId } = await openMeet();
    const [w, m] = [await woman(ids.clubs.LARCH), await man(ids.clubs.LARCH)];
    const res = await enter(app, coach, buckId, ids.clubs.LARCH, [w.id, m.id]);
    expect(res.data?.enterMeetEvent.label).toBe(`${w.name} & ${m.name}`);
    const page = await meet(app, meetId);
    expect(page.data?.meet.events.find((e) => e.id === buckId)?.entries.map((e) => e.label)).toEqual([`${w.name} & ${m.name}`]);
  });

  describe('entry rules, each with its message', () => {
    it('needs two athletes for a pair event', async () => {
      const { buckId } = await openMeet();
      const w = await woman(ids.clubs.LARCH);
      const res = await enter(app, coach, buckId, ids.clubs.LARCH, [w.id]);
      expect(res.errors?.[0]).toMatchObject({ message: 'Mixed double buck needs 2 athletes; 1 picked.', extensions: { field: 'athleteIds' } });
    });

    it('asks a mixed pair for one woman and one man', async () => {
      const { buckId } = await openMeet();
      const [w1, w2] = [await woman(ids.clubs.LARCH), await woman(ids.clubs.LARCH)];
      const res = await enter(app, coach, buckId, ids.clubs.LARCH, [w1.id, w2.id]);
      expect(res.errors?.[0]?.message).toBe('Mixed double buck needs one woman and one man in the pair.');
    });

    it('refuses an athlete outside the division', async () => {
      const { chopId } = await openMeet();
      const w = await woman(ids.clubs.LARCH);
      const res = await enter(app, coach, chopId, ids.clubs.LARCH, [w.id]);
      expect(res.errors?.[0]?.message).toBe(`${w.name} does not compete in the Men's division.`);
    });

    it('refuses the same athlete twice in one event', async () => {
      const { chopId } = await openMeet();
      const m = await man(ids.clubs.LARCH);
      expect(errorCode(await enter(app, coach, chopId, ids.clubs.LARCH, [m.id]))).toBeNull();
      const again = await enter(app, coach, chopId, ids.clubs.LARCH, [m.id]);
      expect(again.errors?.[0]?.message).toBe(`${m.name} is already entered in Underhand chop.`);
    });

    it("holds the meet's per-athlete event limit", async () => {
      const { chopId, buckId } = await openMeet({ maxEventsPerAthlete: 1 });
      const [w, m] = [await woman(ids.clubs.LARCH), await man(ids.clubs.LARCH)];
      expect(errorCode(await enter(app, coach, chopId, ids.clubs.LARCH, [m.id]))).toBeNull();
      const res = await enter(app, coach, buckId, ids.clubs.LARCH, [w.id, m.id]);
      expect(res.errors?.[0]?.message).toBe(`${m.name} has reached this meet's limit of 1 event.`);
    });

    it('refuses entries once the meet stops taking them', async () => {
      const { meetId, chopId } = await openMeet();
      await setMeetStatus(app, organiser, meetId, 'CLOSED');
      const m = await man(ids.clubs.LARCH);
      expect((await enter(app, coach, chopId, ids.clubs.LARCH, [m.id])).errors?.[0]?.message).toBe('This meet is not taking entries.');
    });
  });

  it('reproduces a draw from its stored seed', async () => {
    const { chopId } = await openMeet();
    for (let i = 0; i < 5; i += 1) await enter(app, coach, chopId, ids.clubs.LARCH, [(await man(ids.clubs.LARCH)).id]);
    const first = await drawOrder(app, organiser, chopId, 2);
    const seed = first.data!.drawOrder.drawSeed;
    const order = (r: typeof first) => r.data!.drawOrder.entries.map((e) => [e.id, e.drawPosition, e.heat]).sort((a, b) => Number(a[1]) - Number(b[1]));
    await drawOrder(app, organiser, chopId, 2, seed + 1);
    const again = await drawOrder(app, organiser, chopId, 2, seed);
    expect(again.data!.drawOrder.drawSeed).toBe(seed);
    expect(order(again)).toEqual(order(first));
    expect(order(again).map((e) => e[2])).toEqual([1, 1, 2, 2, 3]);
  });

  it('refuses a coach who tries to draw the order', async () => {
    const { chopId } = await openMeet();
    expect(errorCode(await drawOrder(app, coach, chopId, 2))).toBe('FORBIDDEN');
  });
});
