import { describe, expect, it } from '@jest/globals';

import { loadConfig } from './load-config.js';

describe('loadConfig', () => {
  it('refuses to start in production with the development secrets', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/JWT_SECRET.*DB_PASSWORD.*SEARCH_MASTER_KEY/);
  });

  it('starts in production once every secret is set', () => {
    const config = loadConfig({
      NODE_ENV: 'production',
      JWT_SECRET: 'a-long-production-secret-value',
      DB_PASSWORD: 'another-real-password',
      SEARCH_MASTER_KEY: 'a-real-search-key',
    });
    expect(config.NODE_ENV).toBe('production');
  });

  it('names the variable that is invalid', () => {
    expect(() => loadConfig({ DB_PORT: 'seventy' })).toThrow(/DB_PORT/);
  });
});
