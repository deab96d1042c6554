import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { ArticleKind, ArticleStatus } from '@endgrain/shared';

import { UserEntity } from '../../users/entities/user.entity.js';

/** A Field Note: its workflow state and which revision is the working copy and which the public one. */
@Entity('articles')
export class ArticleEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  /** Fixed at creation, so links keep working when the title changes. */
  @Column({ type: 'varchar', length: 100, unique: true })
  slug: string;

  @Column({ type: 'enum', enum: ['FINDING', 'GUIDE', 'SAFETY_NOTE'] })
  kind: ArticleKind;

  /** The state of the latest revision. */
  @Column({ type: 'enum', enum: ['DRAFT', 'IN_REVIEW', 'PUBLISHED'], default: 'DRAFT' })
  status: ArticleStatus;

  @Column({ name: 'author_id', type: 'char', length: 36 })
  authorId: string;

  @ManyToOne(() => UserEntity)
  @JoinColumn({ name: 'author_id' })
  author: Relation<UserEntity>;

  @Column({ name: 'latest_revision_id', type: 'char', length: 36, nullable: true })
  latestRevisionId: string | null;

  /** What visitors read; stays live while a newer revision is drafted or reviewed. */
  @Column({ name: 'published_revision_id', type: 'char', length: 36, nullable: true })
  publishedRevisionId: string | null;

  @Column({ name: 'published_at', type: 'datetime', precision: 3, nullable: true })
  publishedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
