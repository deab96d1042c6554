import { Module } from '@nestjs/common';

import { LeagueModule } from '../league/league.module.js';
import { EntriesService } from './entries.service.js';
import { EventTypesService } from './event-types.service.js';
import { MeetEventsService } from './meet-events.service.js';
import { MeetsRepository } from './meets.repository.js';
import { MeetsResolver } from './meets.resolver.js';
import { MeetsService } from './meets.service.js';
import { TimekeepersResolver } from './timekeepers.resolver.js';
import { TimekeepersService } from './timekeepers.service.js';

@Module({
  imports: [LeagueModule],
  providers: [MeetsRepository, MeetsService, MeetEventsService, EntriesService, EventTypesService, MeetsResolver, TimekeepersService, TimekeepersResolver],
  exports: [MeetsRepository, MeetsService, TimekeepersService],
})
export class MeetsModule {}
