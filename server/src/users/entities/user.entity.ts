import { Column, CreateDateColumn, Entity, OneToMany, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { Role } from '@endgrain/shared';

import { ClubMembershipEntity } from './club-membership.entity.js';

export type UnitSystemValue = 'METRIC' | 'IMPERIAL';

@Entity('users')
export class UserEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ name: 'password_hash', type: 'varchar', length: 100 })
  passwordHash: string;

  @Column({ name: 'display_name', type: 'varchar', length: 80 })
  displayName: string;

  @Column({ type: 'enum', enum: ['ADMIN', 'ORGANISER', 'COACH', 'ATHLETE'], default: 'ATHLETE' })
  role: Role;

  @Column({ name: 'email_verified_at', type: 'datetime', precision: 3, nullable: true })
  emailVerifiedAt: Date | null;

  @Column({ name: 'unit_system', type: 'enum', enum: ['METRIC', 'IMPERIAL'], default: 'METRIC' })
  unitSystem: UnitSystemValue;

  @Column({ name: 'token_version', type: 'int', default: 0 })
  tokenVersion: number;

  @OneToMany(() => ClubMembershipEntity, (m) => m.user)
  memberships: Relation<ClubMembershipEntity[]>;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
