import 'reflect-metadata';

import { seedFieldNotes } from '../field-notes/seed-field-notes.js';
import { seedHistory } from '../insights/seed-history.js';
import { ensureEventCatalogue } from '../meets/event-types.service.js';
import { loadConfig } from '../config/load-config.js';
import { seedRack } from '../rack/seed-rack.js';
import { seedResults } from '../results/seed-results.js';
import { seedTrials } from '../trials/seed-trials.js';
import { createDataSource } from './data-source.js';
import { seedDemo } from './seed-demo.js';

const config = loadConfig();
const dataSource = createDataSource(config);
await dataSource.initialize();
const added = await ensureEventCatalogue(dataSource);
if (added) console.log(`added ${added} event type(s) to the catalogue`);
if (await seedDemo(dataSource, config.DEMO_PASSWORD)) {
  console.log('seeded the demo league, clubs, people and meets');
  console.log(`seeded ${await seedRack(dataSource)} demo axes`);
  if (await seedResults(dataSource)) console.log('posted and published the demo results');
  console.log(`seeded ${await seedTrials(dataSource)} demo trials`);
  console.log(`seeded ${await seedHistory(dataSource)} invented results from past seasons`);
} else {
  console.log('database already has data: demo scenario left as it is');
}
// The First Cuts series and demo findings are added once, even to an older database.
if (await seedFieldNotes(dataSource)) console.log('added the First Cuts guides and demo findings');
await dataSource.destroy();
