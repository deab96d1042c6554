import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';

import { signUp } from '../utils/auth-operations.js';
import { errorCode, gql } from '../utils/graphql.js';
import { tokenFrom, waitForMail } from '../utils/mail-sink.js';
import { demoToken, lookupIds, type Ids } from '../utils/meet-operations.js';
import { createTestApp, freshEmail } from '../utils/test-app.js';

const invite = (app: INestApplication, token: string, clubId: string, email: string, role = 'ATHLETE') =>
  gql<{ inviteToClub: { id: string } }>(app, 'mutation($i: InviteToClubInput!) { inviteToClub(input: $i) { id email role } }', { i: { clubId, email, role } }, { token });
const accept = (app: INestApplication, token: string, invitation: string) =>
  gql<{ acceptClubInvitation: string }>(app, 'mutation($t: String!) { acceptClubInvitation(token: $t) }', { t: invitation }, { token });

describe('club invitations', () => {
  let app: INestApplication;
  let ids: Ids;
  let coach: string;
  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    coach = await demoToken(app, 'coach@example.org');
  });
  afterAll(async () => {
    await app.close();
  });

  async function invitedNewcomer(role = 'ATHLETE') {
    const email = freshEmail('invitee');
    expect(errorCode(await invite(app, coach, ids.clubs.LARCH, email, role))).toBeNull();
    const link = tokenFrom(await waitForMail(email, /invited to join/i));
    const account = await signUp(app, { email, password: 'bow saw through oak', displayName: 'Invited Person' });
    return { email, link, token: account.data!.signUp.accessToken };
  }

  it('joins the invitee to the club, and the link works once', async () => {
    const { link, token } = await invitedNewcomer('COACH');
    expect((await accept(app, token, link)).data?.acceptClubInvitation).toBe(ids.clubs.LARCH);
    const me = await gql<{ me: { role: string; clubs: { clubId: string; role: string }[] } }>(app, '{ me { role clubs { clubId role } } }', {}, { token });
    expect(me.data?.me).toMatchObject({ role: 'COACH', clubs: [{ clubId: ids.clubs.LARCH, role: 'COACH' }] });
    const again = await accept(app, token, link);
    expect(errorCode(again)).toBe('TOKEN_INVALID');
  });

  it('refuses an expired invitation', async () => {
    const { email, link, token } = await invitedNewcomer();
    await app.get(DataSource).query('UPDATE club_invitations SET expires_at = NOW(3) - INTERVAL 1 DAY WHERE email = ?', [email]);
    const res = await accept(app, token, link);
    expect(res.errors?.[0]?.message).toBe('This invitation has expired. Ask the club for a new one.');
  });

  it('refuses an invitation accepted from another account', async () => {
    const { link } = await invitedNewcomer();
    const other = await signUp(app, { email: freshEmail('forwarded'), password: 'pulp toss partner', displayName: 'Someone Else' });
    expect(errorCode(await accept(app, other.data!.signUp.accessToken, link))).toBe('FORBIDDEN');
  });

  it("stops a coach from inviting people into another club", async () => {
    expect(errorCode(await invite(app, coach, ids.clubs.CFORK, freshEmail('x')))).toBe('FORBIDDEN');
  });
});
