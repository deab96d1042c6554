import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import type { Division } from '@endgrain/shared';

import { EventTypeEntity } from './event-type.entity.js';
import { MeetEntity, type ScoringSchemeValue } from './meet.entity.js';

@Entity('meet_events')
@Index('ix_meet_events_meet', ['meetId', 'position'])
export class MeetEventEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'meet_id', type: 'char', length: 36 })
  meetId: string;

  @ManyToOne(() => MeetEntity, (m) => m.events, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'meet_id' })
  meet: Relation<MeetEntity>;

  @Column({ name: 'event_type_id', type: 'char', length: 36 })
  eventTypeId: string;

  @ManyToOne(() => EventTypeEntity)
  @JoinColumn({ name: 'event_type_id' })
  eventType: Relation<EventTypeEntity>;

  @Column({ type: 'enum', enum: ['MENS', 'WOMENS', 'MIXED'] })
  division: Division;

  /** Species id from the shared species table; null for events without a block. */
  @Column({ name: 'species_id', type: 'varchar', length: 60, nullable: true })
  speciesId: string | null;

  @Column({ name: 'diameter_mm', type: 'decimal', precision: 6, scale: 1, nullable: true, transformer: { to: (v: number | null) => v, from: (v: string | null) => (v === null ? null : Number(v)) } })
  diameterMm: number | null;

  @Column({ name: 'time_limit_hundredths', type: 'int', unsigned: true, nullable: true })
  timeLimitHundredths: number | null;

  @Column({ type: 'decimal', precision: 4, scale: 2, default: 1, transformer: { to: (v: number) => v, from: (v: string) => Number(v) } })
  weight: number;

  /** A host may score this event differently from the meet; null follows the meet. */
  @Column({ name: 'scoring_scheme', type: 'enum', enum: ['FIXED_TABLE', 'FIELD_SIZE', 'PERCENT_OF_BEST'], nullable: true })
  scoringScheme: ScoringSchemeValue | null;

  @Column({ name: 'points_table', type: 'json', nullable: true })
  pointsTable: number[] | null;

  @Column({ type: 'varchar', length: 400, default: '' })
  notes: string;

  @Column({ type: 'smallint', default: 0 })
  position: number;

  @Column({ name: 'heat_size', type: 'tinyint', unsigned: true, nullable: true })
  heatSize: number | null;

  /** The seed of the last draw, stored so the draw can be reproduced and shown. */
  @Column({ name: 'draw_seed', type: 'int', unsigned: true, nullable: true })
  drawSeed: number | null;
}
