// Runs the migrations once on the test database (the real MariaDB that scripts/test.sh starts).
// Plain ESM over the built server: Jest loads global set-up outside its module mapper.
import 'reflect-metadata';

export default async function globalSetup() {
  process.env.NODE_ENV = 'test';
  process.env.DB_PORT ??= '3317';
  process.env.DB_NAME ??= 'endgrain_test';
  const { loadConfig } = await import('../dist/config/load-config.js');
  const { createDataSource } = await import('../dist/database/data-source.js');
  const db = createDataSource(loadConfig());
  await db.initialize();
  await db.runMigrations({ transaction: 'each' });
  const { ensureEventCatalogue } = await import('../dist/meets/event-types.service.js');
  await ensureEventCatalogue(db);
  await db.destroy();
}
