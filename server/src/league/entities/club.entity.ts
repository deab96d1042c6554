import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

@Entity('clubs')
export class ClubEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 120, unique: true })
  name: string;

  @Column({ name: 'short_name', type: 'varchar', length: 16, unique: true })
  shortName: string;

  @Column({ type: 'varchar', length: 80 })
  region: string;

  @Column({ name: 'contact_email', type: 'varchar', length: 254, nullable: true })
  contactEmail: string | null;

  /** Club colours as #rrggbb, chosen by the club. */
  @Column({ name: 'colour_primary', type: 'char', length: 7, default: '#2f5d3a' })
  colourPrimary: string;

  @Column({ name: 'colour_secondary', type: 'char', length: 7, default: '#c9a66b' })
  colourSecondary: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
