import { Inject, Injectable } from '@nestjs/common';
import { KNOWLEDGE_INDEX_UID } from '@endgrain/shared';

import { SearchService } from './search.service.js';

const CACHE_MS = 5 * 60_000;

/**
 * The search-only key for browsers, read from the service with the SDK's getKeys() (the same
 * call works on the hosted service): a key whose only action is "search" on our index or all.
 */
@Injectable()
export class SearchKeyService {
  private cached: { key: string; at: number } | null = null;

  constructor(@Inject(SearchService) private readonly searchService: SearchService) {}

  async searchKey(now = Date.now()): Promise<string> {
    if (this.cached && now - this.cached.at < CACHE_MS) return this.cached.key;
    const { results } = await this.searchService.client.getKeys({ limit: 100 });
    const candidates = results.filter(
      (k) => k.actions.length === 1 && k.actions[0] === 'search' && (k.indexes.includes('*') || k.indexes.includes(KNOWLEDGE_INDEX_UID)) && (k.expiresAt === null || new Date(k.expiresAt).getTime() > now),
    );
    const key = (candidates.find((k) => k.name === 'Default Search API Key') ?? candidates[0])?.key;
    if (!key) throw new Error('the search service lists no search-only key');
    this.cached = { key, at: now };
    return key;
  }
}
