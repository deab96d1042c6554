import { DataSource, type DataSourceOptions } from 'typeorm';

import type { AppConfig } from '../config/env.schema.js';
import { ENTITIES } from './entities.js';
import { MIGRATIONS } from './migrations/index.js';

/** One definition of the connection for the app, the CLI and the tests. Never synchronize. */
export function dataSourceOptions(config: AppConfig): DataSourceOptions {
  return {
    type: 'mariadb',
    host: config.DB_HOST,
    port: config.DB_PORT,
    username: config.DB_USER,
    password: config.DB_PASSWORD,
    database: config.DB_NAME,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'schema_migrations',
    synchronize: false,
    migrationsRun: false,
    extra: { connectionLimit: 10 },
    logging: ['error'],
  };
}

export function createDataSource(config: AppConfig): DataSource {
  return new DataSource(dataSourceOptions(config));
}
