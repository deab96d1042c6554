import { Module } from '@nestjs/common';

import { ClubsService } from './clubs.service.js';
import { InvitationsService } from './invitations.service.js';
import { LeagueRepository } from './league.repository.js';
import { LeagueResolver } from './league.resolver.js';
import { SeasonsService } from './seasons.service.js';

@Module({
  providers: [LeagueRepository, SeasonsService, ClubsService, InvitationsService, LeagueResolver],
  exports: [LeagueRepository, ClubsService],
})
export class LeagueModule {}
