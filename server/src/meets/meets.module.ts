import { Module } from '@nestjs/common';

import { LeagueModule } from '../league/league.module.js';
import { EntriesService } from './entries.service.js';
import { EventTypesService } from './event-types.service.js';
import { MeetEventsService } from './meet-events.service.js';
import { MeetScoringHooks } from './meet-scoring-hooks.js';
import { MeetsRepository } from './meets.repository.js';
import { MeetsResolver } from './meets.resolver.js';
import { MeetsService } from './meets.service.js';
import { TimekeepersResolver } from './timekeepers.resolver.js';
import { TimekeepersService } from './timekeepers.service.js';

@Module({
  imports: [LeagueModule],
  providers: [MeetScoringHooks, MeetsRepository, MeetsService, MeetEventsService, EntriesService, EventTypesService, MeetsResolver, TimekeepersService, TimekeepersResolver],
  exports: [MeetScoringHooks, MeetsRepository, MeetsService, TimekeepersService],
})
export class MeetsModule {}
