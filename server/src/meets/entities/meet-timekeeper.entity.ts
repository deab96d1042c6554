import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** A user an organiser appointed to post one meet's results. */
@Entity('meet_timekeepers')
export class MeetTimekeeperEntity {
  @PrimaryColumn({ name: 'meet_id', type: 'char', length: 36 })
  meetId: string;

  @PrimaryColumn({ name: 'user_id', type: 'char', length: 36 })
  userId: string;

  @Column({ name: 'appointed_by', type: 'char', length: 36, nullable: true })
  appointedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
