import { randomUUID } from 'node:crypto';

import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { handicapMarks, type RaceResult } from '@endgrain/shared';

import { errorCode } from '../utils/graphql.js';
import { handicapSheet, setHandicapMarks, writeSimulatedHistory } from '../utils/insights-operations.js';
import { demoToken, lookupIds } from '../utils/meet-operations.js';
import { createTestApp } from '../utils/test-app.js';

const race = (athleteId: string, k: number, hundredths: number, diameterMm = 300): RaceResult => ({
  resultId: `${athleteId}-${k}`, athleteId, eventType: 'underhand-chop', speciesId: 'eastern-white-pine', condition: 'green', diameterMm, hundredths,
  head: { grind: 'convex', includedDeg: 30, chiselWidthMm: null },
});

describe('handicap marks (MariaDB)', () => {
  let app: INestApplication;
  let organiser: string;
  let coach: string;
  let meetEventId: string;
  let athlete: (sim: string) => string;

  beforeAll(async () => {
    app = await createTestApp();
    const ids = await lookupIds(app);
    [organiser, coach] = await Promise.all([demoToken(app, 'organiser@example.org'), demoToken(app, 'coach@example.org')]);
    // Hand-worked history on 300 mm blocks: fast 30.00/32.00/34.00 → median 32.00; steady 40.00 ×3 → 40.00;
    // rookie one 50.00 on a 250 mm block → ×(300/250)² = 72.00, with one time only ("thin-history").
    const history = [
      race('fast', 0, 3000), race('fast', 1, 3200), race('fast', 2, 3400),
      race('steady', 0, 4000), race('steady', 1, 4000), race('steady', 2, 4000),
      race('rookie', 0, 5000, 250),
    ];
    const { db, seasonId, athletes } = await writeSimulatedHistory(app, ids.clubs.LARCH, ids.eventTypes['underhand-chop'], history);
    athlete = (sim) => athletes.get(sim)!.athleteId;
    const meetId = randomUUID();
    meetEventId = randomUUID();
    await db.query(
      `INSERT INTO meets (id, season_id, host_club_id, name, starts_on, venue, entry_deadline, divisions, scoring_scheme, status)
       VALUES (?, ?, ?, 'Handicap test', '2020-03-01', 'Test ground', '2020-02-20 00:00:00', 'MENS', 'FIELD_SIZE', 'CLOSED')`,
      [meetId, seasonId, ids.clubs.LARCH],
    );
    await db.query("INSERT INTO meet_events (id, meet_id, event_type_id, division, species_id, diameter_mm) VALUES (?, ?, ?, 'MENS', 'eastern-white-pine', 300)", [meetEventId, meetId, ids.eventTypes['underhand-chop']]);
    for (const sim of ['fast', 'steady', 'rookie', 'newcomer']) {
      const athleteId = sim === 'newcomer' ? randomUUID() : athlete(sim);
      if (sim === 'newcomer') await db.query("INSERT INTO athletes (id, club_id, first_name, last_name, divisions) VALUES (?, ?, 'New', 'Comer', 'MENS')", [athleteId, ids.clubs.LARCH]);
      const entryId = randomUUID();
      await db.query('INSERT INTO entries (id, meet_event_id, club_id) VALUES (?, ?, ?)', [entryId, meetEventId, ids.clubs.LARCH]);
      await db.query('INSERT INTO entry_athletes (entry_id, athlete_id, meet_event_id) VALUES (?, ?, ?)', [entryId, athleteId, meetEventId]);
      if (sim === 'newcomer') athlete = ((prev) => (s: string) => (s === 'newcomer' ? athleteId : prev(s)))(athlete);
    }
  });
  afterAll(async () => {
    await app.close();
  });

  it('suggests marks so all finish together, slowest first, and flags thin history', async () => {
    const res = await handicapSheet(app, organiser, meetEventId);
    expect(res.errors).toBeUndefined();
    const marks = res.data!.handicapMarks.marks;
    // Hand-worked: slowest expected is the rookie at 72.00 → mark 0; steady 72 − 40 = 32 s; fast 72 − 32 = 40 s.
    expect(marks.map((m) => [m.athleteId, m.expectedHundredths, m.suggestedSeconds, m.flags])).toEqual([
      [athlete('rookie'), 7200, 0, ['thin-history']],
      [athlete('steady'), 4000, 32, []],
      [athlete('fast'), 3200, 40, []],
      [athlete('newcomer'), null, null, ['no-history']],
    ]);
  });

  it('returns what the shared handicapMarks computes on the same history', async () => {
    const marks = (await handicapSheet(app, organiser, meetEventId)).data!.handicapMarks.marks;
    const shared = handicapMarks(
      [
        { athleteId: 'fast', history: [3000, 3200, 3400].map((h, k) => ({ hundredths: h, diameterMm: 300, date: `2019-10-${5 + 7 * k}` })) },
        { athleteId: 'steady', history: [4000, 4000, 4000].map((h, k) => ({ hundredths: h, diameterMm: 300, date: `2019-10-${5 + 7 * k}` })) },
        { athleteId: 'rookie', history: [{ hundredths: 5000, diameterMm: 250, date: '2019-10-05' }] },
      ],
      { blockDiameterMm: 300 },
    );
    for (const sim of ['fast', 'steady', 'rookie']) {
      const want = shared.marks.find((m) => m.athleteId === sim)!;
      expect(marks.find((m) => m.athleteId === athlete(sim))).toMatchObject({ expectedHundredths: want.expectedHundredths, suggestedSeconds: want.markSeconds, n: want.n });
    }
  });

  it("keeps the organiser's override beside the suggestion and clears it again", async () => {
    const set = await setHandicapMarks(app, organiser, meetEventId, [{ athleteId: athlete('fast'), markSeconds: 38, note: 'sore shoulder' }]);
    expect(set.errors).toBeUndefined();
    expect(set.data!.setHandicapMarks.marks.find((m) => m.athleteId === athlete('fast'))).toMatchObject({ suggestedSeconds: 40, overrideSeconds: 38, markSeconds: 38 });
    const cleared = await setHandicapMarks(app, organiser, meetEventId, [{ athleteId: athlete('fast'), markSeconds: null }]);
    expect(cleared.data!.setHandicapMarks.marks.find((m) => m.athleteId === athlete('fast'))).toMatchObject({ overrideSeconds: null, markSeconds: 40 });
  });

  it('refuses coaches, bad marks and athletes not entered', async () => {
    expect(errorCode(await handicapSheet(app, coach, meetEventId))).toBe('FORBIDDEN');
    const bad = await setHandicapMarks(app, organiser, meetEventId, [{ athleteId: athlete('fast'), markSeconds: 2.5 }]);
    expect(bad.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'marks.0.markSeconds' });
    const stranger = await setHandicapMarks(app, organiser, meetEventId, [{ athleteId: randomUUID(), markSeconds: 5 }]);
    expect(stranger.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'marks.0.athleteId' });
  });
});
