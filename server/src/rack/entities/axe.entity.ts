import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, Unique, UpdateDateColumn, type Relation } from 'typeorm';

import { ClubEntity } from '../../league/entities/club.entity.js';
import { decimal, type AxeStatusValue, type AxeUseValue, type GrindValue } from './rack-values.js';

/** An axe in a club's rack; the row holds the current setup, the service log the history. */
@Entity('axes')
@Unique('uq_axes_club_label', ['clubId', 'label'])
@Index('ix_axes_club_status', ['clubId', 'status'])
export class AxeEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @ManyToOne(() => ClubEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'club_id' })
  club: Relation<ClubEntity>;

  @Column({ type: 'varchar', length: 40 })
  label: string;

  /** Free text: the forge or grinder, as the club knows it. */
  @Column({ type: 'varchar', length: 80, default: '' })
  maker: string;

  @Column({ name: 'head_weight_g', type: 'int', unsigned: true, nullable: true })
  headWeightG: number | null;

  @Column({ name: 'bit_width_mm', type: 'decimal', precision: 6, scale: 2, nullable: true, transformer: decimal })
  bitWidthMm: number | null;

  @Column({ type: 'enum', enum: ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'] })
  grind: GrindValue;

  /** Included angle across both bevel faces; per-side is half of it. */
  @Column({ name: 'bevel_included_deg', type: 'decimal', precision: 5, scale: 2, nullable: true, transformer: decimal })
  bevelIncludedDeg: number | null;

  /** Chisel (secondary bevel) width, measured straight back from the edge. */
  @Column({ name: 'chisel_width_mm', type: 'decimal', precision: 6, scale: 2, nullable: true, transformer: decimal })
  chiselWidthMm: number | null;

  @Column({ name: 'handle_length_mm', type: 'decimal', precision: 6, scale: 1, nullable: true, transformer: decimal })
  handleLengthMm: number | null;

  @Column({ name: 'handle_wood', type: 'varchar', length: 40, default: '' })
  handleWood: string;

  @Column({ name: 'hang_checked', type: 'boolean', default: false })
  hangChecked: boolean;

  @Column({ type: 'boolean', default: false })
  pinned: boolean;

  @Column({ type: 'enum', enum: ['READY', 'NEEDS_EDGE', 'NEEDS_HANDLE', 'HEAD_LOOSE', 'RETIRED'], default: 'READY' })
  status: AxeStatusValue;

  @Column({ name: 'allowed_for', type: 'enum', enum: ['ANYONE', 'DEVELOPING_UP', 'EXPERIENCED_ONLY'], default: 'ANYONE' })
  allowedFor: AxeUseValue;

  /** A public axe is visible outside the club; everything else stays with the club's members. */
  @Column({ name: 'is_public', type: 'boolean', default: false })
  isPublic: boolean;

  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  @Column({ name: 'created_by', type: 'char', length: 36, nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
