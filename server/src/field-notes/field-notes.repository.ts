import { Inject, Injectable } from '@nestjs/common';
import { DataSource, In, type EntityManager } from 'typeorm';

import { ArticleImageEntity } from './entities/article-image.entity.js';
import { ArticleReviewEntity } from './entities/article-review.entity.js';
import { ArticleRevisionEntity } from './entities/article-revision.entity.js';
import { ArticleEntity } from './entities/article.entity.js';
import { FirstCutsStepEntity } from './entities/first-cuts-step.entity.js';
import { ReadingProgressEntity } from './entities/reading-progress.entity.js';

export interface PublishedFilter {
  kind?: string | null;
  species?: string | null;
  grind?: string | null;
  event?: string | null;
  condition?: string | null;
  limit: number;
  offset: number;
}

// Filter name → the key in a revision's tags JSON.
const TAG_PATHS = { species: '$.species', grind: '$.grinds', event: '$.events', condition: '$.conditions' } as const;

/** The only place that queries Field Notes tables. */
@Injectable()
export class FieldNotesRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  get articles() {
    return this.db.getRepository(ArticleEntity);
  }

  get revisions() {
    return this.db.getRepository(ArticleRevisionEntity);
  }

  get reviews() {
    return this.db.getRepository(ArticleReviewEntity);
  }

  get steps() {
    return this.db.getRepository(FirstCutsStepEntity);
  }

  get progress() {
    return this.db.getRepository(ReadingProgressEntity);
  }

  get images() {
    return this.db.getRepository(ArticleImageEntity);
  }

  withAuthor(where: { id: string } | { slug: string }): Promise<ArticleEntity | null> {
    return this.articles.findOne({ where, relations: { author: true } });
  }

  withAuthors(ids: string[]): Promise<ArticleEntity[]> {
    return ids.length ? this.articles.find({ where: { id: In(ids) }, relations: { author: true } }) : Promise.resolve([]);
  }

  async revisionsByIds(ids: (string | null)[]): Promise<Map<string, ArticleRevisionEntity>> {
    const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
    const rows = wanted.length ? await this.revisions.findBy({ id: In(wanted) }) : [];
    return new Map(rows.map((r) => [r.id, r]));
  }

  /** Published notes, newest first, filtered on the published revision's kind and tags. */
  async publishedIds(filter: PublishedFilter): Promise<string[]> {
    const qb = this.articles
      .createQueryBuilder('a')
      .innerJoin(ArticleRevisionEntity, 'r', 'r.id = a.published_revision_id')
      .select('a.id', 'id')
      .orderBy('a.published_at', 'DESC')
      .addOrderBy('a.id', 'ASC')
      .limit(filter.limit)
      .offset(filter.offset);
    if (filter.kind) qb.andWhere('a.kind = :kind', { kind: filter.kind });
    for (const key of Object.keys(TAG_PATHS) as (keyof typeof TAG_PATHS)[]) {
      const value = filter[key];
      if (value) qb.andWhere(`JSON_CONTAINS(r.tags, JSON_QUOTE(:${key}), '${TAG_PATHS[key]}')`, { [key]: value });
    }
    const rows = await qb.getRawMany<{ id: string }>();
    return rows.map((r) => r.id);
  }

  async idsWhere(where: { authorId: string } | { status: 'IN_REVIEW' }): Promise<string[]> {
    const rows = await this.articles.find({ select: { id: true }, where, order: { updatedAt: 'DESC' }, take: 200 });
    return rows.map((r) => r.id);
  }

  history(articleId: string): Promise<[ArticleRevisionEntity[], ArticleReviewEntity[]]> {
    return Promise.all([
      this.revisions.find({ where: { articleId }, relations: { writer: true }, order: { number: 'DESC' } }),
      this.reviews.find({ where: { articleId }, relations: { actor: true }, order: { createdAt: 'DESC' } }),
    ]);
  }

  async nextRevisionNumber(m: EntityManager, articleId: string): Promise<number> {
    const row = await m
      .getRepository(ArticleRevisionEntity)
      .createQueryBuilder('r')
      .select('MAX(r.number)', 'n')
      .where('r.article_id = :articleId', { articleId })
      .getRawOne<{ n: number | null }>();
    return Number(row?.n ?? 0) + 1;
  }

  async slugsStartingWith(base: string): Promise<Set<string>> {
    const rows = await this.articles.createQueryBuilder('a').select('a.slug', 'slug').where('a.slug LIKE :p', { p: `${base}%` }).getRawMany<{ slug: string }>();
    return new Set(rows.map((r) => r.slug));
  }

  async positions(ids: string[]): Promise<Map<string, number>> {
    const rows = ids.length ? await this.steps.findBy({ articleId: In(ids) }) : [];
    return new Map(rows.map((r) => [r.articleId, r.position]));
  }

  async readAts(userId: string | null, ids: string[]): Promise<Map<string, Date>> {
    const rows = userId && ids.length ? await this.progress.findBy({ userId, articleId: In(ids) }) : [];
    return new Map(rows.map((r) => [r.articleId, r.readAt]));
  }

  /** First Cuts steps in order, only those whose note is published. */
  async seriesIds(): Promise<string[]> {
    const rows = await this.steps
      .createQueryBuilder('s')
      .innerJoin(ArticleEntity, 'a', 'a.id = s.article_id AND a.published_revision_id IS NOT NULL')
      .select('s.article_id', 'id')
      .orderBy('s.position', 'ASC')
      .getRawMany<{ id: string }>();
    return rows.map((r) => r.id);
  }

  async replaceSeries(ids: string[]): Promise<void> {
    await this.db.transaction(async (m) => {
      await m.createQueryBuilder().delete().from(FirstCutsStepEntity).execute();
      if (ids.length) await m.getRepository(FirstCutsStepEntity).insert(ids.map((articleId, i) => ({ articleId, position: i + 1 })));
    });
  }

  /** Every published note's id, for a full reindex. */
  async allPublishedIds(): Promise<string[]> {
    const rows = await this.articles.createQueryBuilder('a').select('a.id', 'id').where('a.published_revision_id IS NOT NULL').getRawMany<{ id: string }>();
    return rows.map((r) => r.id);
  }
}
