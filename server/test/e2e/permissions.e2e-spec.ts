import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { setUserRole, signIn, signUp } from '../utils/auth-operations.js';
import { errorCode, gql } from '../utils/graphql.js';
import { createTestApp, freshEmail } from '../utils/test-app.js';

const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? 'endgrain-demo-2026';

describe('roles on the server', () => {
  let app: INestApplication;
  let adminToken: string;
  beforeAll(async () => {
    app = await createTestApp();
    const admin = await signIn(app, { email: 'admin@example.org', password: DEMO_PASSWORD }, '10.88.0.1');
    adminToken = admin.data!.signIn.accessToken;
  });
  afterAll(async () => {
    await app.close();
  });

  it('refuses an athlete an admin-only operation', async () => {
    const up = await signUp(app, { email: freshEmail('athlete'), password: 'underhand on poplar', displayName: 'Nils Hartwell' });
    const token = up.data!.signUp.accessToken;
    const res = await gql(app, '{ users { id } }', {}, { token });
    expect(errorCode(res)).toBe('FORBIDDEN');
  });

  it('asks a signed-out visitor to sign in for a guarded operation', async () => {
    expect(errorCode(await gql(app, '{ users { id } }'))).toBe('UNAUTHENTICATED');
  });

  it('lets an admin make an athlete an organiser, and the old token stops working', async () => {
    const up = await signUp(app, { email: freshEmail('promoted'), password: 'standing block chop', displayName: 'Greer Longacre' });
    const { accessToken, user } = up.data!.signUp;
    const changed = await setUserRole(app, adminToken, user.id, 'ORGANISER');
    expect(changed.data?.setUserRole.role).toBe('ORGANISER');
    expect(errorCode(await gql(app, '{ me { id } }', {}, { token: accessToken }))).toBeNull();
    expect((await gql<{ me: null }>(app, '{ me { id } }', {}, { token: accessToken })).data?.me).toBeNull();
  });

  it('refuses an athlete who tries to change a role', async () => {
    const up = await signUp(app, { email: freshEmail('climber'), password: 'single buck saw run', displayName: 'Jory Pellworth' });
    const { accessToken, user } = up.data!.signUp;
    expect(errorCode(await setUserRole(app, accessToken, user.id, 'ADMIN'))).toBe('FORBIDDEN');
  });

  it('hides stack traces and internals from error responses', async () => {
    const res = await gql(app, '{ users { id } }');
    expect(JSON.stringify(res)).not.toMatch(/stacktrace|at .*\.js:\d+/);
  });
});
