import { Inject, Injectable, type OnModuleInit } from '@nestjs/common';

import { MeetScoringHooks } from '../meets/meet-scoring-hooks.js';
import { rescoreMeet } from './results-writer.js';
import { ResultsRepository } from './results.repository.js';

/** Re-ranks a meet's results whenever its scoring is changed after results are in. */
@Injectable()
export class MeetRescorer implements OnModuleInit {
  constructor(
    @Inject(MeetScoringHooks) private readonly hooks: MeetScoringHooks,
    @Inject(ResultsRepository) private readonly repo: ResultsRepository,
  ) {}

  onModuleInit(): void {
    this.hooks.register(async (m, meetId, change) => {
      await rescoreMeet(this.repo, m, meetId, change);
    });
  }
}
