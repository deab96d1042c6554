import { Body, Controller, Headers, HttpCode, Inject, Param, Post, Res } from '@nestjs/common';
import { KNOWLEDGE_INDEX_UID } from '@endgrain/shared';
import type { Response } from 'express';

import { Public } from '../common/auth/public.decorator.js';
import { APP_CONFIG } from '../config/load-config.js';
import type { AppConfig } from '../config/env.schema.js';

export const SEARCH_RELAY_PATH = '/api/search';
const TIMEOUT_MS = 5000;

// Error bodies in the search service's own shape, so the SDK raises its usual error.
const failure = (message: string, code: string, type = 'invalid_request') => ({ message, code, type, link: '' });

/**
 * A same-origin pass-through for the SDK's two read calls, so browsers need no cross-origin
 * access to the search service. It adds no key: the caller's search-only key goes through as
 * sent, and only searches of our index are relayed, so it can never write or read elsewhere.
 */
@Controller('api/search')
export class SearchRelayController {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  @Post('indexes/:uid/search')
  @Public()
  @HttpCode(200)
  async search(@Param('uid') uid: string, @Body() body: unknown, @Headers('authorization') auth: string | undefined, @Res() res: Response): Promise<void> {
    if (uid !== KNOWLEDGE_INDEX_UID) {
      res.status(404).json(failure(`Index \`${uid}\` not found.`, 'index_not_found'));
      return;
    }
    await this.relay(`/indexes/${KNOWLEDGE_INDEX_UID}/search`, body, auth, res);
  }

  @Post('multi-search')
  @Public()
  @HttpCode(200)
  async multiSearch(@Body() body: { queries?: { indexUid?: unknown }[] } | undefined, @Headers('authorization') auth: string | undefined, @Res() res: Response): Promise<void> {
    const queries = Array.isArray(body?.queries) ? body.queries : [];
    if (queries.some((q) => q?.indexUid !== KNOWLEDGE_INDEX_UID)) {
      res.status(404).json(failure('Only the knowledge index is searched here.', 'index_not_found'));
      return;
    }
    await this.relay('/multi-search', body, auth, res);
  }

  private async relay(path: string, body: unknown, auth: string | undefined, res: Response): Promise<void> {
    const headers: Record<string, string> = { 'content-type': 'application/json' };
    if (auth) headers['authorization'] = auth;
    try {
      const upstream = await fetch(`${this.config.SEARCH_URL.replace(/\/+$/, '')}${path}`, {
        method: 'POST',
        headers,
        body: JSON.stringify(body ?? {}),
        signal: AbortSignal.timeout(TIMEOUT_MS),
      });
      const text = await upstream.text();
      res.status(upstream.status).type('application/json').send(text || '{}');
    } catch {
      res.status(503).json(failure('The search service did not answer.', 'search_unavailable', 'system'));
    }
  }
}
