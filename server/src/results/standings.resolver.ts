import { Inject } from '@nestjs/common';
import { Args, ID, Query, Resolver } from '@nestjs/graphql';
import type { Division } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import { DivisionEnum } from '../league/models/league.enums.js';
import { MeetStandingsModel, SeasonStandingsModel } from './models/standings.model.js';
import { StandingsService } from './standings.service.js';

@Resolver()
export class StandingsResolver {
  constructor(@Inject(StandingsService) private readonly standingsService: StandingsService) {}

  @Query(() => SeasonStandingsModel, { description: 'Season standings across published meets, with the tie-break in words' })
  @Public()
  standings(
    @Args('seasonId', { type: () => ID }) seasonId: string,
    @Args('division', { type: () => DivisionEnum, nullable: true }) division?: DivisionEnum | null,
  ): Promise<SeasonStandingsModel> {
    return this.standingsService.season(seasonId, (division ?? null) as Division | null);
  }

  @Query(() => MeetStandingsModel, { description: 'Team totals per division and event winners of one meet' })
  @Public()
  meetStandings(
    @CurrentUser() actor: AuthUser | null,
    @Args('meetId', { type: () => ID }) meetId: string,
    @Args('division', { type: () => DivisionEnum, nullable: true }) division?: DivisionEnum | null,
  ): Promise<MeetStandingsModel> {
    return this.standingsService.meet(actor, meetId, (division ?? null) as Division | null);
  }
}
