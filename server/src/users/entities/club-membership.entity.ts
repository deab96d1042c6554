import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, Unique, type Relation } from 'typeorm';

import { ClubEntity } from '../../league/entities/club.entity.js';
import { UserEntity } from './user.entity.js';

export type ClubRoleValue = 'COACH' | 'ATHLETE';

/** Club-scoped roles: a coach or athlete reaches only the clubs listed here. */
@Entity('club_memberships')
@Unique('uq_membership_user_club', ['userId', 'clubId'])
export class ClubMembershipEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId: string;

  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @Column({ type: 'enum', enum: ['COACH', 'ATHLETE'] })
  role: ClubRoleValue;

  @ManyToOne(() => UserEntity, (u) => u.memberships, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<UserEntity>;

  @ManyToOne(() => ClubEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'club_id' })
  club: Relation<ClubEntity>;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
