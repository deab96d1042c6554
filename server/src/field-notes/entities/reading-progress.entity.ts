import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A signed-in reader has read a note (First Cuts progress). */
@Entity('reading_progress')
export class ReadingProgressEntity {
  @PrimaryColumn({ name: 'user_id', type: 'char', length: 36 })
  userId: string;

  @PrimaryColumn({ name: 'article_id', type: 'char', length: 36 })
  articleId: string;

  @Column({ name: 'read_at', type: 'datetime', precision: 3 })
  readAt: Date;
}
