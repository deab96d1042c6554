import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

import { gql } from '../utils/graphql.js';
import { createTestApp } from '../utils/test-app.js';

describe('platform: health, headers and GraphQL limits', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('reports the database, search and mail as up with 200', async () => {
    const res = await request(app.getHttpServer()).get('/health');
    expect(res.body).toEqual({ status: 'ok', database: 'up', search: 'up', mail: 'up' });
    expect(res.status).toBe(200);
  });

  it('sends security headers', async () => {
    const res = await request(app.getHttpServer()).get('/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('refuses a query nested deeper than the limit', async () => {
    let type = 'name';
    for (let i = 0; i < 10; i += 1) type = `ofType { ${type} }`;
    const res = await gql(app, `{ __schema { types { fields { type { ${type} } } } } }`);
    expect(res.errors?.[0]?.message).toMatch(/depth/i);
  });

  it('refuses a query with too many aliases', async () => {
    const fields = Array.from({ length: 20 }, (_, i) => `m${i}: me { id }`).join(' ');
    const res = await gql(app, `{ ${fields} }`);
    expect(res.errors?.[0]?.message).toMatch(/alias/i);
  });

  it('hides internal failures behind a plain message', async () => {
    const res = await gql(app, '{ meet(id: "no-such-meet") { id } }');
    expect(res.errors?.[0]).toMatchObject({ message: 'That meet was not found.', extensions: { code: 'NOT_FOUND' } });
  });
});
