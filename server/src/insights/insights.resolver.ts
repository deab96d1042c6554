import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Roles, SignedIn } from '../common/auth/roles.decorator.js';
import { GrainMapFilter, HandicapMarkInput } from './dto/grain-map.filter.js';
import { HandicapService } from './handicap.service.js';
import { InsightsService } from './insights.service.js';
import { GrainCellDetailModel, GrainMapModel } from './models/grain-map.model.js';
import { HandicapSheetModel } from './models/handicap.model.js';

@Resolver()
export class InsightsResolver {
  constructor(
    @Inject(InsightsService) private readonly insightsService: InsightsService,
    @Inject(HandicapService) private readonly handicapService: HandicapService,
  ) {}

  @Query(() => GrainMapModel, { description: 'Species × grind evidence for one event from published results and trials' })
  @SignedIn()
  grainMap(@Args('filter', { type: () => GrainMapFilter }) filter: GrainMapFilter): Promise<GrainMapModel> {
    return this.insightsService.grainMap(filter);
  }

  @Query(() => GrainCellDetailModel, { description: 'The results and trials behind one species × grind cell' })
  @SignedIn()
  grainCell(
    @Args('filter', { type: () => GrainMapFilter }) filter: GrainMapFilter,
    @Args('species', { type: () => String }) species: string,
    @Args('grind', { type: () => String }) grind: string,
  ): Promise<GrainCellDetailModel> {
    return this.insightsService.grainCell(filter, species, grind);
  }

  @Query(() => HandicapSheetModel, { description: 'Suggested start marks for a handicap event, with the working' })
  @Roles('ORGANISER')
  handicapMarks(@Args('meetEventId', { type: () => ID }) meetEventId: string): Promise<HandicapSheetModel> {
    return this.handicapService.sheet(meetEventId);
  }

  @Mutation(() => HandicapSheetModel, { description: "Set or clear the organiser's marks" })
  @Roles('ORGANISER')
  setHandicapMarks(
    @CurrentUser() actor: AuthUser,
    @Args('meetEventId', { type: () => ID }) meetEventId: string,
    @Args('marks', { type: () => [HandicapMarkInput] }) marks: HandicapMarkInput[],
  ): Promise<HandicapSheetModel> {
    return this.handicapService.setMarks(actor, meetEventId, marks);
  }
}
