import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';

import { UserEntity } from '../../users/entities/user.entity.js';

export type ReviewActionValue = 'SUBMITTED' | 'SENT_BACK' | 'PUBLISHED' | 'UNPUBLISHED';

/** The review trail: who sent which revision where, and why. */
@Entity('article_reviews')
export class ArticleReviewEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'article_id', type: 'char', length: 36 })
  articleId: string;

  @Column({ name: 'revision_id', type: 'char', length: 36 })
  revisionId: string;

  @Column({ name: 'actor_id', type: 'char', length: 36 })
  actorId: string;

  @ManyToOne(() => UserEntity)
  @JoinColumn({ name: 'actor_id' })
  actor: Relation<UserEntity>;

  @Column({ type: 'enum', enum: ['SUBMITTED', 'SENT_BACK', 'PUBLISHED', 'UNPUBLISHED'] })
  action: ReviewActionValue;

  @Column({ type: 'varchar', length: 2000, default: '' })
  comment: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
