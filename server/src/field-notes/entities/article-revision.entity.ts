import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, Unique, type Relation } from 'typeorm';
import type { ArticleTags, EvidenceLink } from '@endgrain/shared';

import { UserEntity } from '../../users/entities/user.entity.js';

/** One saved version of a note; never changed once written, so revisions can be compared. */
@Entity('article_revisions')
@Unique('uq_article_revisions_number', ['articleId', 'number'])
export class ArticleRevisionEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'article_id', type: 'char', length: 36 })
  articleId: string;

  @Column({ type: 'smallint', unsigned: true })
  number: number;

  @Column({ type: 'varchar', length: 140 })
  title: string;

  @Column({ type: 'varchar', length: 300 })
  summary: string;

  @Column({ name: 'body_markdown', type: 'mediumtext' })
  bodyMarkdown: string;

  /** Rendered once on save by the strict renderer; the only HTML the client ever injects. */
  @Column({ name: 'body_html', type: 'mediumtext' })
  bodyHtml: string;

  @Column({ type: 'json' })
  tags: ArticleTags;

  @Column({ type: 'json' })
  evidence: EvidenceLink[];

  @Column({ name: 'written_by', type: 'char', length: 36 })
  writtenBy: string;

  @ManyToOne(() => UserEntity)
  @JoinColumn({ name: 'written_by' })
  writer: Relation<UserEntity>;

  @Column({ type: 'varchar', length: 200, default: '' })
  note: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
