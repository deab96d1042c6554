import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { Division } from '@endgrain/shared';

import { decimal } from './result.entity.js';

/** A club's total in one division of one meet, recomputed with every change to the meet's results. */
@Entity('meet_standings')
export class MeetStandingEntity {
  @PrimaryColumn({ name: 'meet_id', type: 'char', length: 36 })
  meetId: string;

  @PrimaryColumn({ type: 'enum', enum: ['MENS', 'WOMENS', 'MIXED'] })
  division: Division;

  @PrimaryColumn({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @Column({ type: 'decimal', precision: 9, scale: 2, transformer: decimal })
  points: number;

  @Column({ type: 'smallint', unsigned: true })
  place: number;

  @Column({ type: 'boolean', default: false })
  tied: boolean;

  /** Event places won: [firsts, seconds, …], for the countback tie-break. */
  @Column({ name: 'place_counts', type: 'json' })
  placeCounts: number[];

  @Column({ type: 'boolean', default: false })
  provisional: boolean;
}
