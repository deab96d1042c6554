import { Controller, Get, Inject, Logger, Res } from '@nestjs/common';
import { KNOWLEDGE_INDEX_UID } from '@endgrain/shared';
import type { Response } from 'express';

import { Public } from '../common/auth/public.decorator.js';
import { SEARCH_RELAY_PATH } from './search-relay.controller.js';
import { SearchKeyService } from './search-key.service.js';

export interface SearchConfig {
  /** Where the browser points the SDK: our same-origin relay to the search service. */
  url: string;
  /** The search-only key: safe in a browser, refused on every write. */
  searchKey: string;
  indexUid: string;
}

/** GET /api/search/config: what the client needs to search with the SDK itself. */
@Controller('api/search')
export class SearchConfigController {
  private readonly logger = new Logger('Search');

  constructor(@Inject(SearchKeyService) private readonly keys: SearchKeyService) {}

  @Get('config')
  @Public()
  async config(@Res() res: Response): Promise<void> {
    try {
      const body: SearchConfig = { url: SEARCH_RELAY_PATH, searchKey: await this.keys.searchKey(), indexUid: KNOWLEDGE_INDEX_UID };
      res.setHeader('cache-control', 'no-store');
      res.status(200).json(body);
    } catch (error) {
      this.logger.warn(`search config unavailable: ${error instanceof Error ? error.message : String(error)}`);
      res.status(503).json({ code: 'SEARCH_UNAVAILABLE', message: 'Search is not available right now; try again in a minute.' });
    }
  }
}
