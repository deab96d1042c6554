import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

export type EmailTokenPurpose = 'VERIFY_EMAIL' | 'RESET_PASSWORD';

/** Single-use, expiring tokens sent by e-mail. Only a SHA-256 of the token is stored. */
@Entity('email_tokens')
export class EmailTokenEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Index('ix_email_tokens_user')
  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId: string;

  @Column({ type: 'enum', enum: ['VERIFY_EMAIL', 'RESET_PASSWORD'] })
  purpose: EmailTokenPurpose;

  @Column({ name: 'token_hash', type: 'char', length: 64, unique: true })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'datetime', precision: 3, nullable: true })
  usedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
