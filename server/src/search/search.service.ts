import { Inject, Injectable } from '@nestjs/common';
import { Meilisearch } from 'meilisearch';

import { APP_CONFIG } from '../config/load-config.js';
import type { AppConfig } from '../config/env.schema.js';

/** The search service through its official SDK: the local fake or the hosted one, by SEARCH_URL. */
@Injectable()
export class SearchService {
  readonly client: Meilisearch;

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    this.client = new Meilisearch({ host: config.SEARCH_URL, apiKey: config.SEARCH_MASTER_KEY, timeout: 3000 });
  }

  async isHealthy(): Promise<boolean> {
    try {
      return await this.client.isHealthy();
    } catch {
      return false;
    }
  }
}
