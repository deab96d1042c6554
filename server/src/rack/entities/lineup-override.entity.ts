import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * An append-only record of a coach handing an axe to an athlete below its experience rule.
 * Plain ids and names (no foreign keys), so the record outlives reassignment and deletion.
 */
@Entity('lineup_overrides')
@Index('ix_lineup_overrides_entry', ['entryId', 'createdAt'])
@Index('ix_lineup_overrides_club', ['clubId', 'createdAt'])
export class LineupOverrideEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @Column({ name: 'meet_id', type: 'char', length: 36 })
  meetId: string;

  @Column({ name: 'entry_id', type: 'char', length: 36 })
  entryId: string;

  @Column({ name: 'athlete_id', type: 'char', length: 36 })
  athleteId: string;

  @Column({ name: 'athlete_name', type: 'varchar', length: 130 })
  athleteName: string;

  @Column({ name: 'athlete_experience', type: 'enum', enum: ['ROOKIE', 'DEVELOPING', 'EXPERIENCED'] })
  athleteExperience: 'ROOKIE' | 'DEVELOPING' | 'EXPERIENCED';

  @Column({ name: 'axe_id', type: 'char', length: 36 })
  axeId: string;

  @Column({ name: 'axe_label', type: 'varchar', length: 40 })
  axeLabel: string;

  @Column({ name: 'axe_allowed_for', type: 'enum', enum: ['ANYONE', 'DEVELOPING_UP', 'EXPERIENCED_ONLY'] })
  axeAllowedFor: 'ANYONE' | 'DEVELOPING_UP' | 'EXPERIENCED_ONLY';

  @Column({ type: 'varchar', length: 300 })
  reason: string;

  @Column({ name: 'by_user_id', type: 'char', length: 36, nullable: true })
  byUserId: string | null;

  @Column({ name: 'by_name', type: 'varchar', length: 80 })
  byName: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
