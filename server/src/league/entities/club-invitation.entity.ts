import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

/** An e-mailed invitation to join a club; single use, expiring, stored as a hash. */
@Entity('club_invitations')
@Index('ix_club_invitations_club', ['clubId'])
export class ClubInvitationEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'club_id', type: 'char', length: 36 })
  clubId: string;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'enum', enum: ['COACH', 'ATHLETE'] })
  role: 'COACH' | 'ATHLETE';

  @Column({ name: 'token_hash', type: 'char', length: 64, unique: true })
  tokenHash: string;

  @Column({ name: 'invited_by', type: 'char', length: 36 })
  invitedBy: string;

  @Column({ name: 'expires_at', type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ name: 'accepted_at', type: 'datetime', precision: 3, nullable: true })
  acceptedAt: Date | null;

  @Column({ name: 'accepted_by', type: 'char', length: 36, nullable: true })
  acceptedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
