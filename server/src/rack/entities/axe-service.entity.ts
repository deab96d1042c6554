import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';

import { AxeEntity } from './axe.entity.js';
import type { AxeServiceKindValue } from './rack-values.js';

/** One setup value before and after a service, in SI units as stored on the axe. */
export type SetupChange = { field: string; before: string | number | boolean | null; after: string | number | boolean | null };

/** One line of an axe's service log: what was done, by whom, when, and what it changed. */
@Entity('axe_services')
@Index('ix_axe_services_axe', ['axeId', 'doneOn'])
export class AxeServiceEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'axe_id', type: 'char', length: 36 })
  axeId: string;

  @ManyToOne(() => AxeEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'axe_id' })
  axe: Relation<AxeEntity>;

  @Column({ type: 'enum', enum: ['REGRIND', 'HONE', 'REHANG', 'TIGHTEN_OR_PIN', 'INSPECT', 'RETIRE', 'SETUP_CORRECTED'] })
  kind: AxeServiceKindValue;

  @Column({ name: 'done_on', type: 'date' })
  doneOn: string;

  /** Who did the work, as written by the coach (often not an account holder). */
  @Column({ name: 'done_by', type: 'varchar', length: 80 })
  doneBy: string;

  /** The account that logged the entry. */
  @Column({ name: 'logged_by', type: 'char', length: 36, nullable: true })
  loggedBy: string | null;

  @Column({ type: 'varchar', length: 1000, default: '' })
  notes: string;

  @Column({ type: 'json' })
  changes: SetupChange[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
