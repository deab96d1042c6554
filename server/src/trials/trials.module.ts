import { Module } from '@nestjs/common';

import { TrialFindingsService } from './trial-findings.service.js';
import { TrialRecordingService } from './trial-recording.service.js';
import { TrialsRepository } from './trials.repository.js';
import { TrialsResolver } from './trials.resolver.js';
import { TrialsService } from './trials.service.js';

/** Trials: a club's axe tests on a block, ranked against a reference axe. */
@Module({
  providers: [TrialsRepository, TrialsService, TrialRecordingService, TrialFindingsService, TrialsResolver],
})
export class TrialsModule {}
