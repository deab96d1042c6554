import { Inject, Module, type OnModuleInit } from '@nestjs/common';

import { SearchIndexer } from '../search/search-indexer.service.js';
import { ArticleSearchSource } from './article-search-source.js';
import { ArticleWorkflowService } from './article-workflow.service.js';
import { ArticlesService } from './articles.service.js';
import { FieldNoteViews } from './field-note-views.js';
import { FieldNotesRepository } from './field-notes.repository.js';
import { FieldNotesResolver } from './field-notes.resolver.js';
import { FirstCutsResolver } from './first-cuts.resolver.js';
import { FirstCutsService } from './first-cuts.service.js';
import { ArticleImagesController } from './images/article-images.controller.js';
import { ArticleImagesService } from './images/article-images.service.js';

/** Field Notes (findings, guides, safety notes), their review workflow, and the First Cuts series. */
@Module({
  controllers: [ArticleImagesController],
  providers: [FieldNotesRepository, FieldNoteViews, ArticlesService, ArticleWorkflowService, FirstCutsService, ArticleImagesService, FieldNotesResolver, FirstCutsResolver],
})
export class FieldNotesModule implements OnModuleInit {
  constructor(
    @Inject(SearchIndexer) private readonly indexer: SearchIndexer,
    @Inject(FieldNotesRepository) private readonly repo: FieldNotesRepository,
  ) {}

  onModuleInit(): void {
    this.indexer.register(new ArticleSearchSource(this.repo));
  }
}
