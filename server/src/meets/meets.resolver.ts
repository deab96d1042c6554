import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import { Roles } from '../common/auth/roles.decorator.js';
import { DrawOrderInput, EnterMeetEventInput, MeetEventInput, MeetInput, MeetsFilter } from './dto/meet.inputs.js';
import { EntriesService } from './entries.service.js';
import { EventTypesService } from './event-types.service.js';
import { MeetEventsService } from './meet-events.service.js';
import { MeetsService } from './meets.service.js';
import { EventTypeModel } from './models/event-type.model.js';
import { EntryModel, MeetChangeModel, MeetDetailModel, MeetEventModel, MeetModel } from './models/meet.model.js';
import { MeetStatusEnum } from './models/meets.enums.js';

@Resolver()
export class MeetsResolver {
  constructor(
    @Inject(MeetsService) private readonly meetsService: MeetsService,
    @Inject(MeetEventsService) private readonly eventsService: MeetEventsService,
    @Inject(EntriesService) private readonly entriesService: EntriesService,
    @Inject(EventTypesService) private readonly eventTypesService: EventTypesService,
  ) {}

  @Query(() => [EventTypeModel], { description: 'The event catalogue' })
  @Public()
  eventTypes(): Promise<EventTypeModel[]> {
    return this.eventTypesService.list();
  }

  @Query(() => [MeetModel], { description: 'Meets; drafts only for organisers' })
  @Public()
  meets(@CurrentUser() actor: AuthUser | null, @Args('filter', { type: () => MeetsFilter, nullable: true }) filter?: MeetsFilter | null): Promise<MeetModel[]> {
    return this.meetsService.list(actor, filter ?? {});
  }

  @Query(() => MeetDetailModel)
  @Public()
  meet(@CurrentUser() actor: AuthUser | null, @Args('id', { type: () => ID }) id: string): Promise<MeetDetailModel> {
    return this.meetsService.detail(actor, id);
  }

  @Query(() => [MeetChangeModel], { description: 'Recorded changes to a meet with results' })
  @Roles('ORGANISER')
  meetChanges(@Args('meetId', { type: () => ID }) meetId: string): Promise<MeetChangeModel[]> {
    return this.meetsService.changes(meetId);
  }

  @Mutation(() => MeetDetailModel)
  @Roles('ORGANISER')
  createMeet(@CurrentUser() actor: AuthUser, @Args('input') input: MeetInput): Promise<MeetDetailModel> {
    return this.meetsService.create(actor, input);
  }

  @Mutation(() => MeetDetailModel)
  @Roles('ORGANISER')
  updateMeet(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string, @Args('input') input: MeetInput): Promise<MeetDetailModel> {
    return this.meetsService.update(actor, id, input);
  }

  @Mutation(() => MeetDetailModel)
  @Roles('ORGANISER')
  setMeetStatus(
    @CurrentUser() actor: AuthUser,
    @Args('id', { type: () => ID }) id: string,
    @Args('status', { type: () => MeetStatusEnum }) status: MeetStatusEnum,
  ): Promise<MeetDetailModel> {
    return this.meetsService.setStatus(actor, id, status);
  }

  @Mutation(() => Boolean, { description: 'Delete a meet without results (otherwise archive it)' })
  @Roles('ORGANISER')
  deleteMeet(@Args('id', { type: () => ID }) id: string): Promise<boolean> {
    return this.meetsService.remove(id);
  }

  @Mutation(() => MeetEventModel)
  @Roles('ORGANISER')
  addMeetEvent(@Args('meetId', { type: () => ID }) meetId: string, @Args('input') input: MeetEventInput): Promise<MeetEventModel> {
    return this.eventsService.add(meetId, input);
  }

  @Mutation(() => MeetEventModel)
  @Roles('ORGANISER')
  updateMeetEvent(@Args('id', { type: () => ID }) id: string, @Args('input') input: MeetEventInput): Promise<MeetEventModel> {
    return this.eventsService.update(id, input);
  }

  @Mutation(() => Boolean)
  @Roles('ORGANISER')
  removeMeetEvent(@Args('id', { type: () => ID }) id: string): Promise<boolean> {
    return this.eventsService.remove(id);
  }

  @Mutation(() => MeetEventModel, { description: 'Draw the order of competition and heats from a stored seed' })
  @Roles('ORGANISER')
  drawOrder(@Args('input') input: DrawOrderInput): Promise<MeetEventModel> {
    return this.eventsService.draw(input);
  }

  @Mutation(() => EntryModel)
  @Roles('COACH')
  enterMeetEvent(@CurrentUser() actor: AuthUser, @Args('input') input: EnterMeetEventInput): Promise<EntryModel> {
    return this.entriesService.enter(actor, input);
  }

  @Mutation(() => Boolean)
  @Roles('COACH', 'ORGANISER')
  withdrawEntry(@CurrentUser() actor: AuthUser, @Args('entryId', { type: () => ID }) entryId: string): Promise<boolean> {
    return this.entriesService.withdraw(actor, entryId);
  }
}
