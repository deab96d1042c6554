import { Column, Entity, PrimaryColumn } from 'typeorm';

@Entity('seasons')
export class SeasonEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 80, unique: true })
  name: string;

  @Column({ name: 'starts_on', type: 'date' })
  startsOn: string;

  @Column({ name: 'ends_on', type: 'date' })
  endsOn: string;

  @Column({ name: 'is_current', type: 'boolean', default: false })
  isCurrent: boolean;
}
