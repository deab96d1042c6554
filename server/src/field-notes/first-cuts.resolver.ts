import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import { Roles, SignedIn } from '../common/auth/roles.decorator.js';
import { FirstCutsService } from './first-cuts.service.js';
import { FieldNoteModel } from './models/field-note.model.js';
import { FirstCutsModel } from './models/first-cuts.model.js';

@Resolver()
export class FirstCutsResolver {
  constructor(@Inject(FirstCutsService) private readonly firstCutsService: FirstCutsService) {}

  @Query(() => FirstCutsModel, { description: 'The newcomer series in order, with the signed-in reader’s progress' })
  @Public()
  firstCuts(@CurrentUser() actor: AuthUser | null): Promise<FirstCutsModel> {
    return this.firstCutsService.series(actor);
  }

  @Mutation(() => FirstCutsModel, { description: 'Replaces the series with these published guides and safety notes, in order' })
  @Roles('ADMIN')
  setFirstCuts(@Args('noteIds', { type: () => [ID] }) noteIds: string[]): Promise<FirstCutsModel> {
    return this.firstCutsService.setSeries(noteIds);
  }

  @Mutation(() => FieldNoteModel, { description: 'Marks a published note read (or, with read: false, unread) for you' })
  @SignedIn()
  markFieldNoteRead(
    @CurrentUser() actor: AuthUser,
    @Args('id', { type: () => ID }) id: string,
    @Args('read', { type: () => Boolean, defaultValue: true }) read: boolean,
  ): Promise<FieldNoteModel> {
    return this.firstCutsService.markRead(actor, id, read);
  }
}
