import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';

import { TrialEntity } from './trial.entity.js';

/** Someone who swung on the block: a roster athlete, or a name (a coach, a visitor). */
@Entity('trial_testers')
export class TrialTesterEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @PrimaryColumn({ name: 'trial_id', type: 'char', length: 36 })
  trialId: string;

  @ManyToOne(() => TrialEntity, (t) => t.testers, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'trial_id' })
  trial: Relation<TrialEntity>;

  @Column({ name: 'athlete_id', type: 'char', length: 36, nullable: true })
  athleteId: string | null;

  @Column({ type: 'varchar', length: 130 })
  name: string;

  @Column({ type: 'smallint', unsigned: true })
  position: number;
}
