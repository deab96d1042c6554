import type { INestApplication } from '@nestjs/common';

import { createApp } from '../../src/app.factory.js';

/** The real app on the real test database, search fake and mail sink (no mocks). */
export async function createTestApp(): Promise<INestApplication> {
  const app = await createApp({ logger: false });
  await app.init();
  return app;
}

let counter = 0;
/** A fresh address per test, so tests never collide and never need truncating. */
export function freshEmail(label: string): string {
  counter += 1;
  return `${label}.${Date.now().toString(36)}.${process.pid}.${counter}@example.org`;
}
