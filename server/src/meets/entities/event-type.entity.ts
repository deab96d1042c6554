import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { EventResultKind } from '@endgrain/shared';

@Entity('event_types')
export class EventTypeEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 60, unique: true })
  code: string;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  @Column({ name: 'result_kind', type: 'enum', enum: ['TIMED', 'SCORED', 'FEWEST_HITS'] })
  resultKind: EventResultKind;

  @Column({ name: 'team_size', type: 'tinyint', unsigned: true, default: 1 })
  teamSize: number;

  @Column({ name: 'mixed_pair', type: 'boolean', default: false })
  mixedPair: boolean;

  @Column({ name: 'uses_head', type: 'boolean', default: false })
  usesHead: boolean;

  @Column({ name: 'default_diameter_mm', type: 'json', nullable: true })
  defaultDiameterMm: Partial<Record<'MENS' | 'WOMENS' | 'MIXED', number>> | null;

  @Column({ name: 'default_penalties', type: 'json' })
  defaultPenalties: { label: string; seconds: number }[];

  @Column({ type: 'varchar', length: 400, default: '' })
  description: string;
}
