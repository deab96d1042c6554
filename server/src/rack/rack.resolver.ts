import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import { Roles } from '../common/auth/roles.decorator.js';
import { AxeServicesService } from './axe-services.service.js';
import { AxesService } from './axes.service.js';
import { AxeServiceInput } from './dto/axe-service.input.js';
import { AxeInput, RackFilter } from './dto/axe.input.js';
import { AxeDetailModel, RackModel } from './models/axe.model.js';
import { PhotosService } from './photos/photos.service.js';

@Resolver()
export class RackResolver {
  constructor(
    @Inject(AxesService) private readonly axes: AxesService,
    @Inject(AxeServicesService) private readonly services: AxeServicesService,
    @Inject(PhotosService) private readonly photos: PhotosService,
  ) {}

  @Query(() => RackModel, { description: "A club's axes: all of them for its members, the public ones for everyone else" })
  @Public()
  rack(
    @CurrentUser() actor: AuthUser | null,
    @Args('clubId', { type: () => ID }) clubId: string,
    @Args('filter', { type: () => RackFilter, nullable: true }) filter?: RackFilter | null,
  ): Promise<RackModel> {
    return this.axes.rack(actor, clubId, filter ?? {});
  }

  @Query(() => AxeDetailModel)
  @Public()
  axe(@CurrentUser() actor: AuthUser | null, @Args('id', { type: () => ID }) id: string): Promise<AxeDetailModel> {
    return this.axes.detail(actor, id);
  }

  @Mutation(() => AxeDetailModel)
  @Roles('COACH')
  addAxe(@CurrentUser() actor: AuthUser, @Args('clubId', { type: () => ID }) clubId: string, @Args('input') input: AxeInput): Promise<AxeDetailModel> {
    return this.axes.add(actor, clubId, input);
  }

  @Mutation(() => AxeDetailModel, { description: 'Edit an axe; setup changes are written to its service log as a correction' })
  @Roles('COACH')
  updateAxe(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string, @Args('input') input: AxeInput): Promise<AxeDetailModel> {
    return this.axes.update(actor, id, input);
  }

  @Mutation(() => Boolean, { description: 'Delete an axe added by mistake; one with results, trials or lineup places is retired instead' })
  @Roles('COACH')
  deleteAxe(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<boolean> {
    return this.axes.remove(actor, id);
  }

  @Mutation(() => AxeDetailModel, { description: 'Log work on an axe; any setup it changed becomes the current setup' })
  @Roles('COACH')
  logAxeService(@CurrentUser() actor: AuthUser, @Args('input') input: AxeServiceInput): Promise<AxeDetailModel> {
    return this.services.log(actor, input);
  }

  @Mutation(() => Boolean)
  @Roles('COACH')
  removeAxePhoto(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<boolean> {
    return this.photos.remove(actor, id);
  }
}
