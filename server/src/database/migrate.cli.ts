import 'reflect-metadata';

import { loadConfig } from '../config/load-config.js';
import { createDataSource } from './data-source.js';

const dataSource = createDataSource(loadConfig());
await dataSource.initialize();
const applied = await dataSource.runMigrations({ transaction: 'each' });
console.log(applied.length ? `applied ${applied.length} migration(s): ${applied.map((m) => m.name).join(', ')}` : 'schema up to date');
await dataSource.destroy();
