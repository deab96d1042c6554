import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, Unique, type Relation } from 'typeorm';

import { AthleteEntity } from '../../league/entities/athlete.entity.js';
import { EntryEntity } from './entry.entity.js';

/** An athlete in an entry; the unique key keeps one athlete to one entry per meet event. */
@Entity('entry_athletes')
@Unique('uq_entry_athletes_event_athlete', ['meetEventId', 'athleteId'])
export class EntryAthleteEntity {
  @PrimaryColumn({ name: 'entry_id', type: 'char', length: 36 })
  entryId: string;

  @PrimaryColumn({ name: 'athlete_id', type: 'char', length: 36 })
  athleteId: string;

  @Column({ name: 'meet_event_id', type: 'char', length: 36 })
  meetEventId: string;

  @Column({ type: 'tinyint', unsigned: true, default: 1 })
  position: number;

  @ManyToOne(() => EntryEntity, (e) => e.athletes, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'entry_id' })
  entry: Relation<EntryEntity>;

  @ManyToOne(() => AthleteEntity)
  @JoinColumn({ name: 'athlete_id' })
  athlete: Relation<AthleteEntity>;
}
