import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { signUp } from '../utils/auth-operations.js';
import { errorCode, gql } from '../utils/graphql.js';
import { lookupIds, type Ids } from '../utils/meet-operations.js';
import { correctResult, importSheet, meetResults, publishMeetResults, recordResult, resultsActors, resultsMeet, type ResultsActors } from '../utils/results-operations.js';
import { createTestApp, freshEmail } from '../utils/test-app.js';

interface Timekeeper { userId: string; displayName: string; email: string }
const FIELDS = 'userId displayName email';

const appoint = (app: INestApplication, token: string, meetId: string, email: string) =>
  gql<{ appointTimekeeper: Timekeeper[] }>(app, `mutation($m: ID!, $e: String!) { appointTimekeeper(meetId: $m, email: $e) { ${FIELDS} } }`, { m: meetId, e: email }, { token });
const remove = (app: INestApplication, token: string, meetId: string, userId: string) =>
  gql<{ removeTimekeeper: Timekeeper[] }>(app, `mutation($m: ID!, $u: ID!) { removeTimekeeper(meetId: $m, userId: $u) { ${FIELDS} } }`, { m: meetId, u: userId }, { token });
const list = (app: INestApplication, token: string, meetId: string) =>
  gql<{ meetTimekeepers: Timekeeper[] }>(app, `query($m: ID!) { meetTimekeepers(meetId: $m) { ${FIELDS} } }`, { m: meetId }, { token });
const meetFlags = (app: INestApplication, token: string, meetId: string) =>
  gql<{ meet: { isTimekeeper: boolean; canManage: boolean } }>(app, 'query($id: ID!) { meet(id: $id) { isTimekeeper canManage } }', { id: meetId }, { token });
const resultFlags = (app: INestApplication, token: string, meetId: string) =>
  gql<{ meetResults: { canRecord: boolean; canPublish: boolean; asTimekeeper: boolean; events: { results: { entryId: string }[] }[] } }>(
    app, 'query($m: ID!) { meetResults(meetId: $m) { canRecord canPublish asTimekeeper events { results { entryId } } } }', { m: meetId }, { token });

describe('timekeepers an organiser appoints for one meet (real MariaDB)', () => {
  let app: INestApplication;
  let ids: Ids;
  let tokens: ResultsActors;
  let keeper: { token: string; email: string; id: string };

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    tokens = await resultsActors(app);
    const email = freshEmail('timekeeper');
    const up = (await signUp(app, { email, password: 'two watches and a pencil', displayName: 'Tamsin Ashbrook' })).data!.signUp;
    keeper = { token: up.accessToken, email, id: up.user.id };
  });
  afterAll(async () => {
    await app.close();
  });

  it('lets an appointed timekeeper post and upload that meet’s results, and nothing more', async () => {
    const { meetId, athletes } = await resultsMeet(app, ids, tokens);
    const other = await resultsMeet(app, ids, tokens);
    const input = { entryId: athletes[0]!.entryId, status: 'FINISHED', times: ['40.00'] };
    expect(errorCode(await recordResult(app, keeper.token, input))).toBe('FORBIDDEN');

    // The address is matched however it is typed.
    const appointed = await appoint(app, tokens.organiser, meetId, `  ${keeper.email.toUpperCase()} `);
    expect(appointed.data?.appointTimekeeper).toEqual([{ userId: keeper.id, displayName: 'Tamsin Ashbrook', email: keeper.email }]);
    expect((await meetFlags(app, keeper.token, meetId)).data?.meet).toEqual({ isTimekeeper: true, canManage: false });

    const posted = await recordResult(app, keeper.token, input);
    expect(posted.errors).toBeUndefined();
    expect(posted.data!.recordResult.results[0]).toMatchObject({ entryId: athletes[0]!.entryId, place: 1 });
    const sheet = `event,division,club,athletes,time\r\nUnderhand chop,Men's,LARCH,${athletes[1]!.name},41.00`;
    expect((await importSheet(app, keeper.token, meetId, sheet)).body).toMatchObject({ imported: 1 });
    // Before publishing, the timekeeper sees what has been posted; publishing stays with organisers.
    expect((await resultFlags(app, keeper.token, meetId)).data?.meetResults).toMatchObject({ canRecord: true, canPublish: false, asTimekeeper: true });
    expect((await resultFlags(app, keeper.token, meetId)).data!.meetResults.events[0]!.results).toHaveLength(2);
    expect(errorCode(await publishMeetResults(app, keeper.token, meetId))).toBe('FORBIDDEN');
    expect(errorCode(await correctResult(app, keeper.token, { ...input, correctionReason: 'misread watch' }))).toBe('FORBIDDEN');
    expect(errorCode(await list(app, keeper.token, meetId))).toBe('FORBIDDEN');

    // Another meet is not theirs.
    expect(errorCode(await recordResult(app, keeper.token, { ...input, entryId: other.athletes[0]!.entryId }))).toBe('FORBIDDEN');
    expect((await importSheet(app, keeper.token, other.meetId, sheet)).status).toBe(403);
    expect((await resultFlags(app, keeper.token, other.meetId)).data?.meetResults).toMatchObject({ canRecord: false, asTimekeeper: false, events: [] });

    // Once published, a timekeeper can no longer change anything.
    for (const [i, x] of athletes.slice(2).entries()) await recordResult(app, tokens.organiser, { entryId: x.entryId, status: 'FINISHED', times: [`${42 + i}.00`] });
    expect((await publishMeetResults(app, tokens.organiser, meetId)).errors).toBeUndefined();
    expect((await resultFlags(app, keeper.token, meetId)).data?.meetResults).toMatchObject({ canRecord: false, canPublish: false });
    expect(errorCode(await recordResult(app, keeper.token, input))).toBe('BAD_USER_INPUT');
  });

  it('takes a timekeeper off the meet, and their access with it', async () => {
    const { meetId, athletes } = await resultsMeet(app, ids, tokens);
    await appoint(app, tokens.organiser, meetId, keeper.email);
    expect((await remove(app, tokens.organiser, meetId, keeper.id)).data?.removeTimekeeper).toEqual([]);
    expect(errorCode(await recordResult(app, keeper.token, { entryId: athletes[0]!.entryId, status: 'FINISHED', times: ['40.00'] }))).toBe('FORBIDDEN');
    expect(errorCode(await remove(app, tokens.organiser, meetId, keeper.id))).toBe('NOT_FOUND');
  });

  it('names the e-mail field for an address nobody signed up with, a malformed one or a second appointment', async () => {
    const { meetId } = await resultsMeet(app, ids, tokens);
    const unknown = await appoint(app, tokens.organiser, meetId, 'nobody.here@example.org');
    expect(unknown.errors?.[0]).toMatchObject({ message: expect.stringMatching(/No Endgrain account uses nobody\.here@example\.org/), extensions: { code: 'BAD_USER_INPUT', field: 'email' } });
    expect((await appoint(app, tokens.organiser, meetId, 'not an address')).errors?.[0]?.extensions).toMatchObject({ field: 'email' });
    await appoint(app, tokens.organiser, meetId, keeper.email);
    expect((await appoint(app, tokens.organiser, meetId, keeper.email)).errors?.[0]?.message).toBe('Tamsin Ashbrook is already a timekeeper for this meet.');
    expect((await list(app, tokens.organiser, meetId)).data?.meetTimekeepers).toHaveLength(1);
  });

  it('leaves appointing to organisers', async () => {
    const { meetId } = await resultsMeet(app, ids, tokens);
    expect(errorCode(await appoint(app, tokens.coach, meetId, keeper.email))).toBe('FORBIDDEN');
    expect(errorCode(await appoint(app, keeper.token, meetId, keeper.email))).toBe('FORBIDDEN');
    expect((await meetResults(app, meetId, tokens.coach)).data?.meetResults.events).toEqual([]);
  });
});
