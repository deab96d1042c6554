import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

export type ResultAuditAction = 'RECORDED' | 'CORRECTED' | 'IMPORTED';

/** Who changed a result, when, from what to what, and why (corrections must say why). */
@Entity('result_audit')
@Index('ix_result_audit_meet', ['meetId', 'createdAt'])
export class ResultAuditEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'result_id', type: 'char', length: 36 })
  resultId: string;

  @Column({ name: 'entry_id', type: 'char', length: 36 })
  entryId: string;

  @Column({ name: 'meet_id', type: 'char', length: 36 })
  meetId: string;

  @Column({ name: 'user_id', type: 'char', length: 36, nullable: true })
  userId: string | null;

  @Column({ type: 'enum', enum: ['RECORDED', 'CORRECTED', 'IMPORTED'] })
  action: ResultAuditAction;

  @Column({ type: 'varchar', length: 300, nullable: true })
  reason: string | null;

  @Column({ type: 'json', nullable: true })
  before: Record<string, unknown> | null;

  @Column({ type: 'json' })
  after: Record<string, unknown>;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
