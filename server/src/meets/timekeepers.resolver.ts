import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Roles } from '../common/auth/roles.decorator.js';
import { MeetTimekeeperModel } from './models/meet.model.js';
import { TimekeepersService } from './timekeepers.service.js';

@Resolver()
export class TimekeepersResolver {
  constructor(@Inject(TimekeepersService) private readonly timekeepersService: TimekeepersService) {}

  @Query(() => [MeetTimekeeperModel], { description: "The people appointed to post a meet's results" })
  @Roles('ORGANISER')
  meetTimekeepers(@Args('meetId', { type: () => ID }) meetId: string): Promise<MeetTimekeeperModel[]> {
    return this.timekeepersService.list(meetId);
  }

  @Mutation(() => [MeetTimekeeperModel], { description: "Appoint a signed-up user, by e-mail, to post this meet's results until it is published" })
  @Roles('ORGANISER')
  appointTimekeeper(
    @CurrentUser() actor: AuthUser,
    @Args('meetId', { type: () => ID }) meetId: string,
    @Args('email', { type: () => String }) email: string,
  ): Promise<MeetTimekeeperModel[]> {
    return this.timekeepersService.appoint(actor, meetId, email);
  }

  @Mutation(() => [MeetTimekeeperModel], { description: 'Take a timekeeper off a meet' })
  @Roles('ORGANISER')
  removeTimekeeper(@Args('meetId', { type: () => ID }) meetId: string, @Args('userId', { type: () => ID }) userId: string): Promise<MeetTimekeeperModel[]> {
    return this.timekeepersService.remove(meetId, userId);
  }
}
