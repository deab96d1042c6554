import { describe, expect, it } from '@jest/globals';

import { readConfig } from './read-config.js';

describe('readConfig', () => {
  it('uses port 7700, the development key and .data/search by default', () => {
    // Defaults stated in the search-fake assignment.
    expect(readConfig({})).toEqual({
      port: 7700, host: '127.0.0.1', masterKey: 'endgrain-dev-search-master-key', dataDir: '.data/search', taskDelayMs: 10,
    });
  });

  it('reads the port, key and folder from the environment', () => {
    expect(readConfig({ SEARCH_PORT: '7811', SEARCH_MASTER_KEY: 'a-long-local-secret', SEARCH_DATA_DIR: '/tmp/s' }))
      .toMatchObject({ port: 7811, masterKey: 'a-long-local-secret', dataDir: '/tmp/s' });
  });

  it('refuses to start in production with the development key', () => {
    expect(() => readConfig({ NODE_ENV: 'production' })).toThrow(/development default/);
    expect(readConfig({ NODE_ENV: 'production', SEARCH_MASTER_KEY: 'prod-secret-0123456789' }).masterKey).toBe('prod-secret-0123456789');
  });

  it('refuses a port that is not a number', () => {
    expect(() => readConfig({ SEARCH_PORT: 'seventy' })).toThrow(/SEARCH_PORT/);
  });
});
