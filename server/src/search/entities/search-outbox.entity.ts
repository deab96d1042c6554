import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A document waiting to be written to (or removed from) the search index. */
@Entity('search_outbox')
export class SearchOutboxEntity {
  @PrimaryGeneratedColumn({ type: 'bigint', unsigned: true })
  id: string;

  @Column({ name: 'doc_type', type: 'varchar', length: 20 })
  docType: string;

  @Column({ name: 'doc_id', type: 'char', length: 36 })
  docId: string;

  /** Bumped by every new change, so a send that read older data does not clear the row. */
  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  @Column({ type: 'int', unsigned: true, default: 0 })
  attempts: number;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'due_at', type: 'datetime', precision: 3 })
  dueAt: Date;

  @Column({ name: 'claim_token', type: 'char', length: 36, nullable: true })
  claimToken: string | null;

  @Column({ name: 'claimed_until', type: 'datetime', precision: 3, nullable: true })
  claimedUntil: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
