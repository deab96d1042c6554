import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';

import { AthleteEntity } from '../../league/entities/athlete.entity.js';
import { EntryEntity } from '../../meets/entities/entry.entity.js';
import { AxeEntity } from './axe.entity.js';

/** Who swings which axe for one of the club's entries; one row per entry. */
@Entity('lineup_assignments')
@Index('ix_lineup_assignments_axe', ['axeId'])
export class LineupAssignmentEntity {
  @PrimaryColumn({ name: 'entry_id', type: 'char', length: 36 })
  entryId: string;

  @ManyToOne(() => EntryEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'entry_id' })
  entry: Relation<EntryEntity>;

  @Column({ name: 'athlete_id', type: 'char', length: 36 })
  athleteId: string;

  @ManyToOne(() => AthleteEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'athlete_id' })
  athlete: Relation<AthleteEntity>;

  /** Null for events without a head (saws, throws with the club's own kit) or not chosen yet. */
  @Column({ name: 'axe_id', type: 'char', length: 36, nullable: true })
  axeId: string | null;

  @ManyToOne(() => AxeEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'axe_id' })
  axe: Relation<AxeEntity> | null;

  /** Set when the coach overrode the axe's experience rule; the log keeps every override. */
  @Column({ name: 'override_id', type: 'char', length: 36, nullable: true })
  overrideId: string | null;

  @Column({ name: 'assigned_by', type: 'char', length: 36, nullable: true })
  assignedBy: string | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
