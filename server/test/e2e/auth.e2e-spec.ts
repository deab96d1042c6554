import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { loadConfig } from '../../src/config/load-config.js';
import { me, requestPasswordReset, resetPassword, signIn, signUp, verifyEmail } from '../utils/auth-operations.js';
import { errorCode } from '../utils/graphql.js';
import { tokenFrom, waitForMail } from '../utils/mail-sink.js';
import { createTestApp, freshEmail } from '../utils/test-app.js';

const PASSWORD = 'splitting maul at dawn';
let ipCounter = 0;
const freshIp = (): string => `10.77.${Math.floor(++ipCounter / 250)}.${ipCounter % 250}`;

describe('accounts (real MariaDB, real SMTP to the mail sink)', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('signs up, mails a verification link, verifies, signs in and answers me', async () => {
    const email = freshEmail('newcomer');
    const up = await signUp(app, { email: email.toUpperCase(), password: PASSWORD, displayName: 'Wren Oakhurst' });
    expect(up.errors).toBeUndefined();
    expect(up.data?.signUp.user).toMatchObject({ email, role: 'ATHLETE', emailVerified: false });

    const mail = await waitForMail(email, /confirm your e-mail/i);
    const verified = await verifyEmail(app, tokenFrom(mail));
    expect(verified.data?.verifyEmail.emailVerified).toBe(true);

    const session = await signIn(app, { email, password: PASSWORD }, freshIp());
    const token = session.data?.signIn.accessToken;
    expect(token).toBeTruthy();
    const who = await me(app, token);
    expect(who.data?.me).toMatchObject({ email, displayName: 'Wren Oakhurst', emailVerified: true });
  });

  it('answers me with null when signed out', async () => {
    expect((await me(app)).data?.me).toBeNull();
  });

  it('uses a verification link only once', async () => {
    const email = freshEmail('once');
    await signUp(app, { email, password: PASSWORD, displayName: 'Ivo Quenby' });
    const token = tokenFrom(await waitForMail(email, /confirm/i));
    expect(errorCode(await verifyEmail(app, token))).toBeNull();
    const again = await verifyEmail(app, token);
    expect(errorCode(again)).toBe('TOKEN_INVALID');
  });

  it('refuses a duplicate e-mail with a clear error on the email field', async () => {
    const email = freshEmail('dup');
    await signUp(app, { email, password: PASSWORD, displayName: 'Petra Kettleby' });
    const again = await signUp(app, { email: ` ${email.toUpperCase()} `, password: PASSWORD, displayName: 'Petra K' });
    expect(errorCode(again)).toBe('EMAIL_TAKEN');
    expect(again.errors?.[0]?.extensions?.field).toBe('email');
  });

  it('refuses a short or common password, naming the password field', async () => {
    const short = await signUp(app, { email: freshEmail('short'), password: 'axe123', displayName: 'Rune Dunmere' });
    expect(short.errors?.[0]).toMatchObject({ extensions: { code: 'BAD_USER_INPUT', field: 'password' } });
    const common = await signUp(app, { email: freshEmail('common'), password: 'Password123', displayName: 'Rune D' });
    expect(common.errors?.[0]?.message).toMatch(/commonly used/);
  });

  it('gives a wrong password and an unknown e-mail the same error', async () => {
    const email = freshEmail('uniform');
    await signUp(app, { email, password: PASSWORD, displayName: 'Oona Rookwood' });
    const wrong = await signIn(app, { email, password: 'not the right one' }, freshIp());
    const unknown = await signIn(app, { email: freshEmail('nobody'), password: PASSWORD }, freshIp());
    expect(wrong.errors?.[0]?.message).toBe(unknown.errors?.[0]?.message);
    expect(errorCode(wrong)).toBe('INVALID_CREDENTIALS');
    expect(errorCode(unknown)).toBe('INVALID_CREDENTIALS');
  });

  it('throttles sign-in per account, even from different addresses', async () => {
    const email = freshEmail('throttled');
    await signUp(app, { email, password: PASSWORD, displayName: 'Cato Vantwood' });
    const limit = loadConfig().SIGN_IN_LIMIT_PER_ACCOUNT;
    for (let i = 0; i < limit; i += 1) {
      expect(errorCode(await signIn(app, { email, password: 'wrong guess here' }, freshIp()))).toBe('INVALID_CREDENTIALS');
    }
    const blocked = await signIn(app, { email, password: PASSWORD }, freshIp());
    expect(errorCode(blocked)).toBe('TOO_MANY_ATTEMPTS');
    expect(blocked.errors?.[0]?.message).toMatch(/try again in/i);
  });

  it('throttles sign-in per IP address across accounts', async () => {
    const ip = freshIp();
    const limit = loadConfig().SIGN_IN_LIMIT_PER_IP;
    for (let i = 0; i < limit; i += 1) {
      await signIn(app, { email: freshEmail('spray'), password: 'guessing again' }, ip);
    }
    const blocked = await signIn(app, { email: freshEmail('spray'), password: 'guessing again' }, ip);
    expect(errorCode(blocked)).toBe('TOO_MANY_ATTEMPTS');
  });

  it('resets a password by e-mail: the old password stops working and the link works once', async () => {
    const email = freshEmail('reset');
    const up = await signUp(app, { email, password: PASSWORD, displayName: 'Hale Northcote' });
    const oldToken = up.data!.signUp.accessToken;
    expect((await requestPasswordReset(app, email)).data?.requestPasswordReset).toBe(true);
    const token = tokenFrom(await waitForMail(email, /reset your/i));

    const weak = await resetPassword(app, token, 'short');
    expect(weak.errors?.[0]?.extensions?.field).toBe('password');
    expect(errorCode(await resetPassword(app, token, 'a brand new bevel angle'))).toBeNull();
    expect(errorCode(await resetPassword(app, token, 'and another one please'))).toBe('TOKEN_INVALID');

    expect(errorCode(await signIn(app, { email, password: PASSWORD }, freshIp()))).toBe('INVALID_CREDENTIALS');
    expect(errorCode(await signIn(app, { email, password: 'a brand new bevel angle' }, freshIp()))).toBeNull();
    expect((await me(app, oldToken)).data?.me).toBeNull(); // other sessions ended
  });

  it('answers a reset request for an unknown address exactly as for a known one', async () => {
    const res = await requestPasswordReset(app, freshEmail('ghost'));
    expect(res).toEqual({ data: { requestPasswordReset: true } });
  });
});
