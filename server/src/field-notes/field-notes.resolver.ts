import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import { Roles } from '../common/auth/roles.decorator.js';
import { ArticleWorkflowService } from './article-workflow.service.js';
import { ArticlesService } from './articles.service.js';
import { FieldNoteInput, FieldNotesFilter } from './dto/field-note.inputs.js';
import { FieldNoteHistoryModel } from './models/field-note-history.model.js';
import { FieldNoteModel } from './models/field-note.model.js';

@Resolver()
export class FieldNotesResolver {
  constructor(
    @Inject(ArticlesService) private readonly articlesService: ArticlesService,
    @Inject(ArticleWorkflowService) private readonly workflowService: ArticleWorkflowService,
  ) {}

  @Query(() => [FieldNoteModel], { description: 'Published Field Notes, newest first' })
  @Public()
  fieldNotes(@CurrentUser() actor: AuthUser | null, @Args('filter', { type: () => FieldNotesFilter, nullable: true }) filter?: FieldNotesFilter | null): Promise<FieldNoteModel[]> {
    return this.articlesService.list(filter ?? { limit: 50, offset: 0 }, actor);
  }

  @Query(() => FieldNoteModel, { description: 'A note by its slug; `draft: true` shows the working copy to its author and reviewers' })
  @Public()
  fieldNote(
    @CurrentUser() actor: AuthUser | null,
    @Args('slug') slug: string,
    @Args('draft', { type: () => Boolean, defaultValue: false }) draft: boolean,
  ): Promise<FieldNoteModel> {
    return this.articlesService.get(slug, draft, actor);
  }

  @Query(() => [FieldNoteModel], { description: "The caller's own notes in every state" })
  @Roles('COACH')
  myFieldNotes(@CurrentUser() actor: AuthUser): Promise<FieldNoteModel[]> {
    return this.articlesService.mine(actor);
  }

  @Query(() => [FieldNoteModel], { description: 'Notes waiting for review' })
  @Roles('ADMIN')
  fieldNoteReviewQueue(@CurrentUser() actor: AuthUser): Promise<FieldNoteModel[]> {
    return this.articlesService.reviewQueue(actor);
  }

  @Query(() => FieldNoteHistoryModel, { description: 'Revisions and review trail, for the author and reviewers' })
  @Roles('COACH')
  fieldNoteHistory(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<FieldNoteHistoryModel> {
    return this.articlesService.history(id, actor);
  }

  @Mutation(() => FieldNoteModel)
  @Roles('COACH')
  createFieldNote(@CurrentUser() actor: AuthUser, @Args('input') input: FieldNoteInput): Promise<FieldNoteModel> {
    return this.articlesService.create(actor, input);
  }

  @Mutation(() => FieldNoteModel, { description: 'Saves a new revision' })
  @Roles('COACH')
  updateFieldNote(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string, @Args('input') input: FieldNoteInput): Promise<FieldNoteModel> {
    return this.articlesService.update(actor, id, input);
  }

  @Mutation(() => Boolean, { description: 'Deletes a note that was never published' })
  @Roles('COACH')
  deleteFieldNoteDraft(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<boolean> {
    return this.articlesService.deleteDraft(actor, id);
  }

  @Mutation(() => FieldNoteModel)
  @Roles('COACH')
  submitFieldNote(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<FieldNoteModel> {
    return this.workflowService.submit(actor, id);
  }

  @Mutation(() => FieldNoteModel, { description: 'Returns a note in review to its author, with a comment' })
  @Roles('ADMIN')
  sendBackFieldNote(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string, @Args('comment') comment: string): Promise<FieldNoteModel> {
    return this.workflowService.sendBack(actor, id, comment);
  }

  @Mutation(() => FieldNoteModel, { description: 'Publishes the revision in review (never your own finding)' })
  @Roles('COACH')
  publishFieldNote(
    @CurrentUser() actor: AuthUser,
    @Args('id', { type: () => ID }) id: string,
    @Args('comment', { type: () => String, defaultValue: '' }) comment: string,
  ): Promise<FieldNoteModel> {
    return this.workflowService.publish(actor, id, comment);
  }

  @Mutation(() => FieldNoteModel, { description: 'Takes a note off the public pages, with a reason' })
  @Roles('ADMIN')
  unpublishFieldNote(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string, @Args('comment') comment: string): Promise<FieldNoteModel> {
    return this.workflowService.unpublish(actor, id, comment);
  }
}
