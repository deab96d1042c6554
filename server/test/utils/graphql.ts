import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

export interface GqlError {
  message: string;
  extensions?: { code?: string; field?: string; [key: string]: unknown };
}

export interface GqlResponse<T> {
  data?: T | null;
  errors?: GqlError[];
}

/** POSTs one GraphQL operation through the HTTP stack, as a client would. */
export async function gql<T>(
  app: INestApplication,
  query: string,
  variables: Record<string, unknown> = {},
  options: { token?: string; ip?: string } = {},
): Promise<GqlResponse<T>> {
  let req = request(app.getHttpServer()).post('/graphql').set('content-type', 'application/json');
  if (options.token) req = req.set('authorization', `Bearer ${options.token}`);
  if (options.ip) req = req.set('x-forwarded-for', options.ip);
  const res = await req.send({ query, variables });
  return res.body as GqlResponse<T>;
}

/** The first error's code, or null when the operation succeeded. */
export function errorCode(response: GqlResponse<unknown>): string | null {
  return response.errors?.[0]?.extensions?.code ?? null;
}
