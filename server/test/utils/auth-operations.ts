import type { INestApplication } from '@nestjs/common';

import { gql, type GqlResponse } from './graphql.js';

export interface UserShape {
  id: string;
  email: string;
  displayName: string;
  role: string;
  emailVerified: boolean;
}
interface AuthPayload {
  accessToken: string;
  user: UserShape;
}

const USER = 'id email displayName role emailVerified';

export function signUp(app: INestApplication, input: { email: string; password: string; displayName: string }) {
  return gql<{ signUp: AuthPayload }>(app, `mutation($input: SignUpInput!) { signUp(input: $input) { accessToken user { ${USER} } } }`, { input });
}

export function signIn(app: INestApplication, input: { email: string; password: string }, ip?: string) {
  return gql<{ signIn: AuthPayload }>(app, `mutation($input: SignInInput!) { signIn(input: $input) { accessToken user { ${USER} } } }`, { input }, { ip });
}

export function me(app: INestApplication, token?: string): Promise<GqlResponse<{ me: UserShape | null }>> {
  return gql(app, `{ me { ${USER} } }`, {}, { token });
}

export function verifyEmail(app: INestApplication, token: string) {
  return gql<{ verifyEmail: UserShape }>(app, `mutation($token: String!) { verifyEmail(token: $token) { ${USER} } }`, { token });
}

export function requestPasswordReset(app: INestApplication, email: string) {
  return gql<{ requestPasswordReset: boolean }>(app, `mutation($email: String!) { requestPasswordReset(email: $email) }`, { email });
}

export function resetPassword(app: INestApplication, token: string, password: string) {
  return gql<{ resetPassword: boolean }>(app, `mutation($t: String!, $p: String!) { resetPassword(token: $t, password: $p) }`, { t: token, p: password });
}

export function setUserRole(app: INestApplication, token: string, userId: string, role: string) {
  return gql<{ setUserRole: UserShape }>(app, `mutation($u: ID!, $r: Role!) { setUserRole(userId: $u, role: $r) { ${USER} } }`, { u: userId, r: role }, { token });
}
