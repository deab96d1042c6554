import { Controller, Get, Inject, Res } from '@nestjs/common';
import type { Response } from 'express';
import { DataSource } from 'typeorm';

import { Public } from '../common/auth/public.decorator.js';
import { MailService } from '../mail/mail.service.js';
import { SearchService } from '../search/search.service.js';

type State = 'up' | 'down';

/** GET /health: 200 when the database, search and mail are all reachable, 503 otherwise. */
@Controller('health')
export class HealthController {
  constructor(
    @Inject(DataSource) private readonly db: DataSource,
    @Inject(SearchService) private readonly search: SearchService,
    @Inject(MailService) private readonly mail: MailService,
  ) {}

  @Get()
  @Public()
  async health(@Res() res: Response): Promise<void> {
    const [database, search, mail] = await Promise.all([this.databaseState(), this.state(this.search.isHealthy()), this.state(this.mail.isHealthy())]);
    const ok = database === 'up' && search === 'up' && mail === 'up';
    res.status(ok ? 200 : 503).json({ status: ok ? 'ok' : 'degraded', database, search, mail });
  }

  private async databaseState(): Promise<State> {
    try {
      await this.db.query('SELECT 1');
      return 'up';
    } catch {
      return 'down';
    }
  }

  private async state(check: Promise<boolean>): Promise<State> {
    return (await check) ? 'up' : 'down';
  }
}
