import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, OneToMany, PrimaryColumn, type Relation } from 'typeorm';

import { ClubEntity } from '../../league/entities/club.entity.js';
import { EntryAthleteEntity } from './entry-athlete.entity.js';
import { MeetEventEntity } from './meet-event.entity.js';

/** One competing unit (an athlete, a pair or a team) in one meet event. */
@Entity('entries')
@Index('ix_entries_event', ['meetEventId', 'drawPosition'])
export class EntryEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'meet_event_id', type: 'char', length: 36 })
  meetEventId: string;

  @ManyToOne(() => MeetEventEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'meet_event_id' })
  meetEvent: Relation<MeetEventEntity>;

  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @ManyToOne(() => ClubEntity)
  @JoinColumn({ name: 'club_id' })
  club: Relation<ClubEntity>;

  @OneToMany(() => EntryAthleteEntity, (a) => a.entry, { cascade: ['insert'] })
  athletes: Relation<EntryAthleteEntity[]>;

  @Column({ name: 'draw_position', type: 'smallint', nullable: true })
  drawPosition: number | null;

  @Column({ type: 'smallint', nullable: true })
  heat: number | null;

  @Column({ name: 'entered_by', type: 'char', length: 36, nullable: true })
  enteredBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
