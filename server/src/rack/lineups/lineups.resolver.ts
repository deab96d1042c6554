import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { CurrentUser } from '../../common/auth/current-user.decorator.js';
import { Roles, SignedIn } from '../../common/auth/roles.decorator.js';
import { AssignLineupInput } from '../dto/lineup.input.js';
import { AssignLineupPayload, LineupModel, LineupOverrideModel } from '../models/lineup.model.js';
import { LineupsService } from './lineups.service.js';

@Resolver()
export class LineupsResolver {
  constructor(@Inject(LineupsService) private readonly lineups: LineupsService) {}

  @Query(() => LineupModel, { description: "A club's entries in a meet with who swings which axe" })
  @SignedIn()
  lineup(@CurrentUser() actor: AuthUser, @Args('meetId', { type: () => ID }) meetId: string, @Args('clubId', { type: () => ID }) clubId: string): Promise<LineupModel> {
    return this.lineups.lineup(actor, meetId, clubId);
  }

  @Query(() => [LineupOverrideModel], { description: 'Every experience override the club recorded for a meet, newest first' })
  @Roles('COACH')
  lineupOverrides(@CurrentUser() actor: AuthUser, @Args('meetId', { type: () => ID }) meetId: string, @Args('clubId', { type: () => ID }) clubId: string): Promise<LineupOverrideModel[]> {
    return this.lineups.overrides(actor, meetId, clubId);
  }

  @Mutation(() => AssignLineupPayload, { description: 'Give an entry its athlete and axe; refusals are errors, cautions come back as warnings' })
  @Roles('COACH')
  assignLineup(@CurrentUser() actor: AuthUser, @Args('input') input: AssignLineupInput): Promise<AssignLineupPayload> {
    return this.lineups.assign(actor, input);
  }

  @Mutation(() => Boolean)
  @Roles('COACH')
  clearLineupAssignment(@CurrentUser() actor: AuthUser, @Args('entryId', { type: () => ID }) entryId: string): Promise<boolean> {
    return this.lineups.clear(actor, entryId);
  }
}
