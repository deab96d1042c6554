import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import { Roles, SignedIn } from '../common/auth/roles.decorator.js';
import { ClubsService } from './clubs.service.js';
import { AthleteInput, ClubInput, CreateSeasonInput, InviteToClubInput } from './dto/league.inputs.js';
import { InvitationsService } from './invitations.service.js';
import { AthleteModel } from './models/athlete.model.js';
import { ClubDetailModel, ClubInvitationModel, ClubModel } from './models/club.model.js';
import { SeasonModel } from './models/season.model.js';
import { SeasonsService } from './seasons.service.js';

@Resolver()
export class LeagueResolver {
  constructor(
    @Inject(SeasonsService) private readonly seasonsService: SeasonsService,
    @Inject(ClubsService) private readonly clubsService: ClubsService,
    @Inject(InvitationsService) private readonly invitations: InvitationsService,
  ) {}

  @Query(() => [SeasonModel])
  @Public()
  seasons(): Promise<SeasonModel[]> {
    return this.seasonsService.list();
  }

  @Mutation(() => SeasonModel)
  @Roles('ORGANISER')
  createSeason(@Args('input') input: CreateSeasonInput): Promise<SeasonModel> {
    return this.seasonsService.create(input);
  }

  @Mutation(() => SeasonModel)
  @Roles('ORGANISER')
  setCurrentSeason(@Args('id', { type: () => ID }) id: string): Promise<SeasonModel> {
    return this.seasonsService.setCurrent(id);
  }

  @Query(() => [ClubModel])
  @Public()
  clubs(@CurrentUser() actor: AuthUser | null): Promise<ClubModel[]> {
    return this.clubsService.list(actor);
  }

  @Query(() => ClubDetailModel)
  @Public()
  club(@CurrentUser() actor: AuthUser | null, @Args('id', { type: () => ID }) id: string): Promise<ClubDetailModel> {
    return this.clubsService.detail(id, actor);
  }

  @Mutation(() => ClubModel)
  @Roles('ADMIN')
  createClub(@Args('input') input: ClubInput): Promise<ClubModel> {
    return this.clubsService.create(input);
  }

  @Mutation(() => ClubModel)
  @Roles('COACH')
  updateClub(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string, @Args('input') input: ClubInput): Promise<ClubModel> {
    return this.clubsService.update(actor, id, input);
  }

  @Query(() => AthleteModel)
  @Public()
  athlete(@Args('id', { type: () => ID }) id: string): Promise<AthleteModel> {
    return this.clubsService.athlete(id);
  }

  @Mutation(() => AthleteModel)
  @Roles('COACH')
  addAthlete(@CurrentUser() actor: AuthUser, @Args('input') input: AthleteInput): Promise<AthleteModel> {
    return this.clubsService.addAthlete(actor, input);
  }

  @Mutation(() => AthleteModel)
  @Roles('COACH')
  updateAthlete(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string, @Args('input') input: AthleteInput): Promise<AthleteModel> {
    return this.clubsService.updateAthlete(actor, id, input);
  }

  @Mutation(() => Boolean)
  @Roles('COACH')
  removeAthlete(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<boolean> {
    return this.clubsService.removeAthlete(actor, id);
  }

  @Query(() => [ClubInvitationModel])
  @Roles('COACH')
  clubInvitations(@CurrentUser() actor: AuthUser, @Args('clubId', { type: () => ID }) clubId: string): Promise<ClubInvitationModel[]> {
    return this.invitations.list(actor, clubId);
  }

  @Mutation(() => ClubInvitationModel, { description: 'E-mail an invitation to join the club as a coach or athlete.' })
  @Roles('COACH')
  inviteToClub(@CurrentUser() actor: AuthUser, @Args('input') input: InviteToClubInput): Promise<ClubInvitationModel> {
    return this.invitations.invite(actor, input);
  }

  @Mutation(() => ID, { description: 'Join the club named in an invitation; answers the club id.' })
  @SignedIn()
  acceptClubInvitation(@CurrentUser() actor: AuthUser, @Args('token') token: string): Promise<string> {
    return this.invitations.accept(actor, token);
  }
}
