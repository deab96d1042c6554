import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, OneToMany, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { Division, MeetStatus } from '@endgrain/shared';

import { ClubEntity } from '../../league/entities/club.entity.js';
import { SeasonEntity } from '../../league/entities/season.entity.js';
import { MeetEventEntity } from './meet-event.entity.js';

export type ScoringSchemeValue = 'FIXED_TABLE' | 'FIELD_SIZE' | 'PERCENT_OF_BEST';

@Entity('meets')
@Index('ix_meets_season_date', ['seasonId', 'startsOn'])
export class MeetEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'season_id', type: 'char', length: 36 })
  seasonId: string;

  @ManyToOne(() => SeasonEntity)
  @JoinColumn({ name: 'season_id' })
  season: Relation<SeasonEntity>;

  @Column({ name: 'host_club_id', type: 'char', length: 36 })
  hostClubId: string;

  @ManyToOne(() => ClubEntity)
  @JoinColumn({ name: 'host_club_id' })
  hostClub: Relation<ClubEntity>;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ name: 'starts_on', type: 'date' })
  startsOn: string;

  @Column({ type: 'varchar', length: 160 })
  venue: string;

  @Column({ name: 'entry_deadline', type: 'datetime', precision: 3 })
  entryDeadline: Date;

  @Column({ type: 'set', enum: ['MENS', 'WOMENS', 'MIXED'] })
  divisions: Division[];

  @Column({ name: 'scoring_scheme', type: 'enum', enum: ['FIXED_TABLE', 'FIELD_SIZE', 'PERCENT_OF_BEST'] })
  scoringScheme: ScoringSchemeValue;

  /** Place points for FIXED_TABLE, e.g. [7,6,5,4,3,2,1]. */
  @Column({ name: 'points_table', type: 'json', nullable: true })
  pointsTable: number[] | null;

  @Column({ name: 'best_entry_per_club', type: 'boolean', default: false })
  bestEntryPerClub: boolean;

  @Column({ name: 'minimum_one_point', type: 'boolean', default: false })
  minimumOnePoint: boolean;

  /** Ties within the top N places go to a run-off instead of sharing; 0 for none. */
  @Column({ name: 'run_off_top_places', type: 'tinyint', unsigned: true, default: 0 })
  runOffTopPlaces: number;

  @Column({ name: 'max_events_per_athlete', type: 'tinyint', unsigned: true, nullable: true })
  maxEventsPerAthlete: number | null;

  @Column({ name: 'require_mixed_pairs', type: 'boolean', default: true })
  requireMixedPairs: boolean;

  @Column({ type: 'enum', enum: ['DRAFT', 'OPEN', 'CLOSED', 'RUNNING', 'PUBLISHED', 'ARCHIVED'], default: 'DRAFT' })
  status: MeetStatus;

  @Column({ name: 'created_by', type: 'char', length: 36, nullable: true })
  createdBy: string | null;

  @OneToMany(() => MeetEventEntity, (e) => e.meet)
  events: Relation<MeetEventEntity[]>;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
