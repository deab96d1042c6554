import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

/** A recorded change to a meet after it has results (who, when, before, after). */
@Entity('meet_changes')
@Index('ix_meet_changes_meet', ['meetId', 'createdAt'])
export class MeetChangeEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'meet_id', type: 'char', length: 36 })
  meetId: string;

  @Column({ name: 'user_id', type: 'char', length: 36, nullable: true })
  userId: string | null;

  @Column({ type: 'varchar', length: 200 })
  summary: string;

  @Column({ type: 'json' })
  before: Record<string, unknown>;

  @Column({ type: 'json' })
  after: Record<string, unknown>;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
