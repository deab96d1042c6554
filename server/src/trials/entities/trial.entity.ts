import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, OneToMany, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';

import { ClubEntity } from '../../league/entities/club.entity.js';
import { decimal } from '../../rack/entities/rack-values.js';
import { AxeEntity } from '../../rack/entities/axe.entity.js';
import { TrialRunEntity } from './trial-run.entity.js';
import { TrialTesterEntity } from './trial-tester.entity.js';
import type { TrialConditionValue } from './trial-values.js';

/** A club's axe test on one block, compared with one reference axe. */
@Entity('trials')
@Index('ix_trials_club_date', ['clubId', 'testedOn'])
@Index('ix_trials_wood', ['speciesId', 'condition'])
export class TrialEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @ManyToOne(() => ClubEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'club_id' })
  club: Relation<ClubEntity>;

  @Column({ name: 'tested_on', type: 'date' })
  testedOn: string;

  @Column({ name: 'species_id', type: 'varchar', length: 60 })
  speciesId: string;

  @Column({ name: 'diameter_mm', type: 'decimal', precision: 6, scale: 1, transformer: decimal })
  diameterMm: number;

  @Column({ name: 'block_condition', type: 'enum', enum: ['GREEN', 'SEASONED', 'DRY', 'PUNKY', 'FROZEN'] })
  condition: TrialConditionValue;

  @Column({ type: 'varchar', length: 200, default: '' })
  knots: string;

  @Column({ name: 'face_used', type: 'varchar', length: 120, default: '' })
  faceUsed: string;

  @Column({ name: 'air_temp_c', type: 'decimal', precision: 4, scale: 1, nullable: true, transformer: decimal })
  airTempC: number | null;

  @Column({ name: 'reference_axe_id', type: 'char', length: 36 })
  referenceAxeId: string;

  @ManyToOne(() => AxeEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'reference_axe_id' })
  referenceAxe: Relation<AxeEntity>;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  /** Bumped on every save; a phone that saves over a newer version is told so. */
  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  /** The token of the last save, so a resend of the same draft is answered, not refused. */
  @Column({ name: 'save_token', type: 'varchar', length: 64, nullable: true })
  saveToken: string | null;

  @Column({ name: 'recorded_by', type: 'char', length: 36, nullable: true })
  recordedBy: string | null;

  @OneToMany(() => TrialTesterEntity, (t) => t.trial)
  testers: Relation<TrialTesterEntity[]>;

  @OneToMany(() => TrialRunEntity, (r) => r.trial)
  runs: Relation<TrialRunEntity[]>;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
