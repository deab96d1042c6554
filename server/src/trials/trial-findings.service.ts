import { Inject, Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';

import type { AuthUser } from '../common/auth/auth-user.js';
import { ArticlesService } from '../field-notes/articles.service.js';
import { ArticleKindEnum, EvidenceKindEnum } from '../field-notes/models/field-notes.enums.js';
import type { TrialFindingModel } from './models/trial.model.js';
import { trialFinding } from './trial-finding.js';
import { toFindingModel, toTrialModel } from './trials.mappers.js';
import { TrialsRepository } from './trials.repository.js';
import { TrialsService } from './trials.service.js';

/**
 * "Publish as a finding": keeps a summary the knowledge base can read (trial_summaries) and opens a
 * draft Field Note pre-filled with the verdict table and a link back. Publishing again refreshes the
 * summary and keeps the note it already opened; the author edits that note in Field Notes.
 */
@Injectable()
export class TrialFindingsService {
  constructor(
    @Inject(TrialsRepository) private readonly repo: TrialsRepository,
    @Inject(TrialsService) private readonly trialsService: TrialsService,
    @Inject(ModuleRef) private readonly moduleRef: ModuleRef,
  ) {}

  async publish(actor: AuthUser, trialId: string, now = new Date()): Promise<TrialFindingModel> {
    const trial = await this.trialsService.editable(actor, trialId);
    const before = await this.repo.summaryOf(trialId);
    const model = toTrialModel(trial, { canEdit: true, summary: before });
    const draft = trialFinding(model);
    const note = before?.articleId ? { id: before.articleId, slug: before.articleSlug } : await this.openDraftNote(actor, trialId, model.recommendation, draft);
    await this.repo.summaries().save({
      trialId,
      title: draft.title,
      summary: draft.summary,
      bodyMarkdown: draft.bodyMarkdown,
      speciesId: draft.speciesId,
      condition: draft.condition,
      grinds: draft.grinds,
      articleId: note?.id ?? null,
      articleSlug: note?.slug ?? null,
      publishedBy: actor.id,
      publishedAt: now,
    });
    return toFindingModel((await this.repo.summaryOf(trialId))!);
  }

  private async openDraftNote(actor: AuthUser, trialId: string, recommendation: string, draft: ReturnType<typeof trialFinding>) {
    // Field Notes is its own module and does not export its service: look it up app-wide.
    const articles = this.moduleRef.get(ArticlesService, { strict: false });
    const note = await articles.create(actor, {
      kind: ArticleKindEnum.FINDING,
      title: draft.title,
      summary: draft.summary,
      bodyMarkdown: draft.bodyMarkdown,
      tags: { species: [draft.speciesId], grinds: draft.grinds, events: [], conditions: [draft.condition], free: ['trial'] },
      evidence: [{ kind: EvidenceKindEnum.TRIAL, refId: trialId, label: draft.title.slice(0, 120), summary: recommendation.slice(0, 400) }],
      note: 'Opened from a trial',
    });
    return { id: note.id, slug: note.slug };
  }
}
