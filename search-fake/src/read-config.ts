import { DEFAULT_MASTER_KEY, type SearchFakeOptions } from './server.js';

/**
 * Settings from the environment: SEARCH_PORT, SEARCH_MASTER_KEY, SEARCH_DATA_DIR,
 * SEARCH_TASK_DELAY_MS. Refuses the well-known development key in production.
 */
export function readConfig(env: Record<string, string | undefined>): Required<Omit<SearchFakeOptions, 'host'>> & { host: string } {
  const port = Number(env['SEARCH_PORT'] ?? 7700);
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error(`SEARCH_PORT must be a port number, not ${env['SEARCH_PORT']}`);
  const masterKey = env['SEARCH_MASTER_KEY'] ?? DEFAULT_MASTER_KEY;
  if (env['NODE_ENV'] === 'production' && masterKey === DEFAULT_MASTER_KEY) {
    throw new Error('SEARCH_MASTER_KEY is the development default; set a secret of your own in production');
  }
  const taskDelayMs = Number(env['SEARCH_TASK_DELAY_MS'] ?? 10);
  if (!Number.isFinite(taskDelayMs) || taskDelayMs < 0) throw new Error(`SEARCH_TASK_DELAY_MS must be a number of milliseconds, not ${env['SEARCH_TASK_DELAY_MS']}`);
  return { port, host: '127.0.0.1', masterKey, dataDir: env['SEARCH_DATA_DIR'] ?? '.data/search', taskDelayMs };
}
