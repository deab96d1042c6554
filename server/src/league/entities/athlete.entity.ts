import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';

import { ClubEntity } from './club.entity.js';

export type ExperienceLevelValue = 'ROOKIE' | 'DEVELOPING' | 'EXPERIENCED';
export type DivisionValue = 'MENS' | 'WOMENS' | 'MIXED';

/** A roster entry; most are typed by a coach and have no account (userId null). */
@Entity('athletes')
export class AthleteEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Index('ix_athletes_club')
  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @ManyToOne(() => ClubEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'club_id' })
  club: Relation<ClubEntity>;

  @Column({ name: 'user_id', type: 'char', length: 36, nullable: true, unique: true })
  userId: string | null;

  @Column({ name: 'first_name', type: 'varchar', length: 60 })
  firstName: string;

  @Column({ name: 'last_name', type: 'varchar', length: 60 })
  lastName: string;

  /** Divisions the athlete may enter, comma-separated (MENS, WOMENS, MIXED). */
  @Column({ type: 'set', enum: ['MENS', 'WOMENS', 'MIXED'] })
  divisions: DivisionValue[];

  @Column({ type: 'enum', enum: ['ROOKIE', 'DEVELOPING', 'EXPERIENCED'], default: 'ROOKIE' })
  experience: ExperienceLevelValue;

  @Column({ name: 'first_season_year', type: 'smallint', nullable: true })
  firstSeasonYear: number | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
