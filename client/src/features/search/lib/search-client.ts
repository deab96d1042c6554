import type { Meilisearch } from 'meilisearch';

import type { SearchConfig } from '../api/search-config.js';

const clients = new Map<string, Promise<Meilisearch>>();

/**
 * The official SDK with the search-only key, the server's relay path made absolute for it.
 * Loaded on first use, so pages that never search never download the SDK.
 */
export function searchClientFor(config: SearchConfig, origin = window.location.origin): Promise<Meilisearch> {
  const host = new URL(config.url, origin).toString().replace(/\/$/, '');
  const key = `${host} ${config.searchKey}`;
  let client = clients.get(key);
  if (!client) {
    client = import('meilisearch').then(({ Meilisearch: Client }) => new Client({ host, apiKey: config.searchKey }));
    clients.set(key, client);
  }
  return client;
}
