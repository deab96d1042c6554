import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** An organiser's final start mark for one athlete in one handicap event. */
@Entity('handicap_marks')
export class HandicapMarkEntity {
  @PrimaryColumn({ name: 'meet_event_id', type: 'char', length: 36 })
  meetEventId: string;

  @PrimaryColumn({ name: 'athlete_id', type: 'char', length: 36 })
  athleteId: string;

  @Column({ name: 'mark_seconds', type: 'smallint', unsigned: true })
  markSeconds: number;

  @Column({ type: 'varchar', length: 200, default: '' })
  note: string;

  @Column({ name: 'set_by', type: 'char', length: 36, nullable: true })
  setBy: string | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
