import 'reflect-metadata';

import { loadConfig } from '../config/load-config.js';
import { createDataSource } from './data-source.js';
import { ensureEventCatalogue } from '../meets/event-types.service.js';
import { seedDemo } from './seed-demo.js';

const config = loadConfig();
const dataSource = createDataSource(config);
await dataSource.initialize();
const added = await ensureEventCatalogue(dataSource);
if (added) console.log(`added ${added} event type(s) to the catalogue`);
const seeded = await seedDemo(dataSource, config.DEMO_PASSWORD);
console.log(seeded ? 'seeded the demo scenario' : 'database already has data: demo scenario left as it is');
await dataSource.destroy();
