import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';

import { decimal, type GrindValue } from '../../rack/entities/rack-values.js';
import { AxeEntity } from '../../rack/entities/axe.entity.js';
import { TrialEntity } from './trial.entity.js';
import type { KeennessValue, StoredSwing } from './trial-values.js';

/** One axe swung by one tester on the trial's block; the head columns are the setup that day. */
@Entity('trial_runs')
export class TrialRunEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @PrimaryColumn({ name: 'trial_id', type: 'char', length: 36 })
  trialId: string;

  @ManyToOne(() => TrialEntity, (t) => t.runs, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'trial_id' })
  trial: Relation<TrialEntity>;

  @Column({ type: 'smallint', unsigned: true })
  position: number;

  @Index('ix_trial_runs_axe')
  @Column({ name: 'axe_id', type: 'char', length: 36 })
  axeId: string;

  @ManyToOne(() => AxeEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'axe_id' })
  axe: Relation<AxeEntity>;

  @Column({ name: 'tester_id', type: 'char', length: 36 })
  testerId: string;

  @Column({ type: 'json' })
  swings: StoredSwing[];

  /** Step on the release scale, 1 (holds fast) to 5 (springs out); null when not judged. */
  @Column({ name: 'release_step', type: 'tinyint', unsigned: true, nullable: true })
  releaseStep: number | null;

  @Column({ type: 'enum', enum: ['DULL', 'WORKING', 'KEEN'], nullable: true })
  keenness: KeennessValue | null;

  @Column({ type: 'varchar', length: 200, default: '' })
  feel: string;

  @Column({ type: 'varchar', length: 1000, default: '' })
  notes: string;

  @Column({ type: 'enum', enum: ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'] })
  grind: GrindValue;

  @Column({ name: 'bevel_included_deg', type: 'decimal', precision: 5, scale: 2, nullable: true, transformer: decimal })
  bevelIncludedDeg: number | null;

  @Column({ name: 'chisel_width_mm', type: 'decimal', precision: 6, scale: 2, nullable: true, transformer: decimal })
  chiselWidthMm: number | null;
}
