import { Column, Entity, PrimaryColumn } from 'typeorm';

import type { TrialConditionValue } from './trial-values.js';

/** A trial published as a finding: the text the knowledge base can use, and the draft note it opened. */
@Entity('trial_summaries')
export class TrialSummaryEntity {
  @PrimaryColumn({ name: 'trial_id', type: 'char', length: 36 })
  trialId: string;

  @Column({ type: 'varchar', length: 140 })
  title: string;

  @Column({ type: 'varchar', length: 300 })
  summary: string;

  @Column({ name: 'body_markdown', type: 'text' })
  bodyMarkdown: string;

  @Column({ name: 'species_id', type: 'varchar', length: 60 })
  speciesId: string;

  @Column({ name: 'block_condition', type: 'enum', enum: ['GREEN', 'SEASONED', 'DRY', 'PUNKY', 'FROZEN'] })
  condition: TrialConditionValue;

  @Column({ type: 'json' })
  grinds: string[];

  @Column({ name: 'article_id', type: 'char', length: 36, nullable: true })
  articleId: string | null;

  @Column({ name: 'article_slug', type: 'varchar', length: 100, nullable: true })
  articleSlug: string | null;

  @Column({ name: 'published_by', type: 'char', length: 36, nullable: true })
  publishedBy: string | null;

  @Column({ name: 'published_at', type: 'datetime', precision: 3 })
  publishedAt: Date;
}
