import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { BlockCondition, Division, HeadGrind, PostedStatus } from '@endgrain/shared';

import { EntryEntity } from '../../meets/entities/entry.entity.js';

/** DECIMAL columns come back from mysql2 as strings. */
export const decimal = {
  to: (v: number | null | undefined) => v,
  from: (v: string | null) => (v === null ? null : Number(v)),
};

const STATUS = ['FINISHED', 'SCRATCH', 'DID_NOT_FINISH', 'DISQUALIFIED'];

/**
 * One entry's result. What was posted (status, raw watch times, score, penalty, head, block)
 * and what is computed from it for the whole meet event (official time, place, points), stored
 * so the explorer can sort and filter on indexes.
 */
@Entity('results')
@Index('ix_results_event_place', ['meetEventId', 'place'])
export class ResultEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'entry_id', type: 'char', length: 36, unique: true })
  entryId: string;

  @ManyToOne(() => EntryEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'entry_id' })
  entry: Relation<EntryEntity>;

  @Column({ name: 'meet_event_id', type: 'char', length: 36 })
  meetEventId: string;

  @Column({ name: 'meet_id', type: 'char', length: 36 })
  meetId: string;

  @Column({ name: 'season_id', type: 'char', length: 36 })
  seasonId: string;

  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @Column({ name: 'event_type_id', type: 'char', length: 36 })
  eventTypeId: string;

  @Column({ type: 'enum', enum: ['MENS', 'WOMENS', 'MIXED'] })
  division: Division;

  @Column({ name: 'meet_date', type: 'date' })
  meetDate: string;

  @Column({ type: 'enum', enum: STATUS })
  status: PostedStatus;

  @Column({ name: 'dq_reason', type: 'varchar', length: 200, nullable: true })
  dqReason: string | null;

  /** Every watch's reading in hundredths, as posted. */
  @Column({ name: 'raw_times', type: 'json' })
  rawTimes: number[];

  /** Official time before penalties, from the raw times. */
  @Column({ name: 'time_hundredths', type: 'int', unsigned: true, nullable: true })
  timeHundredths: number | null;

  @Column({ type: 'decimal', precision: 9, scale: 2, nullable: true, transformer: decimal })
  score: number | null;

  @Column({ name: 'penalty_hundredths', type: 'int', unsigned: true, default: 0 })
  penaltyHundredths: number;

  @Column({ name: 'run_off_rank', type: 'tinyint', unsigned: true, nullable: true })
  runOffRank: number | null;

  /** After the time limit: an over-limit run reads DISQUALIFIED here. */
  @Column({ name: 'final_status', type: 'enum', enum: STATUS })
  finalStatus: PostedStatus;

  @Column({ name: 'final_reason', type: 'varchar', length: 200, nullable: true })
  finalReason: string | null;

  @Column({ name: 'total_hundredths', type: 'int', unsigned: true, nullable: true })
  totalHundredths: number | null;

  @Column({ type: 'smallint', unsigned: true, nullable: true })
  place: number | null;

  @Column({ type: 'boolean', default: false })
  tied: boolean;

  @Column({ type: 'decimal', precision: 8, scale: 2, default: 0, transformer: decimal })
  points: number;

  @Column({ name: 'counts_for_club', type: 'boolean', default: true })
  countsForClub: boolean;

  @Column({ type: 'boolean', default: false })
  provisional: boolean;

  /** The rack axe used, if any; the columns below are the head as it was that day. */
  @Column({ name: 'axe_id', type: 'char', length: 36, nullable: true })
  axeId: string | null;

  @Column({ name: 'axe_label', type: 'varchar', length: 40, nullable: true })
  axeLabel: string | null;

  @Column({ type: 'enum', enum: ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'], nullable: true })
  grind: HeadGrind | null;

  @Column({ name: 'bevel_included_deg', type: 'decimal', precision: 5, scale: 2, nullable: true, transformer: decimal })
  bevelIncludedDeg: number | null;

  @Column({ name: 'chisel_width_mm', type: 'decimal', precision: 6, scale: 2, nullable: true, transformer: decimal })
  chiselWidthMm: number | null;

  @Column({ name: 'species_id', type: 'varchar', length: 60, nullable: true })
  speciesId: string | null;

  @Column({ name: 'diameter_mm', type: 'decimal', precision: 6, scale: 1, nullable: true, transformer: decimal })
  diameterMm: number | null;

  @Column({ name: 'block_condition', type: 'enum', enum: ['GREEN', 'SEASONED', 'DRY', 'PUNKY', 'FROZEN', 'KNOTTY'], nullable: true })
  blockCondition: BlockCondition | null;

  @Column({ name: 'recorded_by', type: 'char', length: 36, nullable: true })
  recordedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
