import 'reflect-metadata';

import { createApp } from './app.factory.js';
import { loadConfig } from './config/load-config.js';

const config = loadConfig();
const app = await createApp();
await app.listen(config.PORT, config.HOST);
console.log(`Endgrain server listening on ${config.PUBLIC_URL}`);
