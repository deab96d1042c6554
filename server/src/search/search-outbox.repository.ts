import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';

export interface OutboxRow {
  id: string;
  docType: string;
  docId: string;
  version: number;
}

export interface OutboxState {
  pending: number;
  failing: number;
  lastError: string | null;
}

/** How long a claim holds before another server may take the row over (a crashed sender). */
const CLAIM_SECONDS = 60;
/** Retries back off 2, 4, 8 … seconds, at most five minutes. */
const MAX_BACKOFF_SECONDS = 300;

/**
 * The search outbox: a change writes its row in the same transaction as the data, so nothing is
 * lost when the search service is down; senders claim rows, and clear them only if unchanged since.
 */
@Injectable()
export class SearchOutboxRepository {
  constructor(@Inject(DataSource) private readonly db: DataSource) {}

  async enqueue(m: EntityManager | null, docType: string, ids: readonly string[]): Promise<void> {
    if (ids.length === 0) return;
    const runner = m ?? this.db.manager;
    for (let i = 0; i < ids.length; i += 500) {
      const chunk = ids.slice(i, i + 500);
      await runner.query(
        `INSERT INTO search_outbox (doc_type, doc_id) VALUES ${chunk.map(() => '(?, ?)').join(', ')}
         ON DUPLICATE KEY UPDATE version = version + 1, attempts = 0, last_error = NULL, due_at = CURRENT_TIMESTAMP(3)`,
        chunk.flatMap((id) => [docType, id]),
      );
    }
  }

  /** Takes up to `limit` due rows for this sender. */
  async claim(limit: number): Promise<{ token: string; rows: OutboxRow[] }> {
    const token = randomUUID();
    await this.db.query(
      `UPDATE search_outbox SET claim_token = ?, claimed_until = CURRENT_TIMESTAMP(3) + INTERVAL ${CLAIM_SECONDS} SECOND
       WHERE due_at <= CURRENT_TIMESTAMP(3) AND (claimed_until IS NULL OR claimed_until < CURRENT_TIMESTAMP(3))
       ORDER BY due_at, id LIMIT ?`,
      [token, limit],
    );
    const rows = await this.db.query<{ id: string; doc_type: string; doc_id: string; version: number }[]>(
      'SELECT id, doc_type, doc_id, version FROM search_outbox WHERE claim_token = ?',
      [token],
    );
    return { token, rows: rows.map((r) => ({ id: String(r.id), docType: r.doc_type, docId: r.doc_id, version: Number(r.version) })) };
  }

  /** Clears sent rows; a row changed meanwhile is released for the next round instead. */
  async finish(token: string, rows: readonly OutboxRow[]): Promise<void> {
    for (const row of rows) await this.db.query('DELETE FROM search_outbox WHERE id = ? AND version = ?', [row.id, row.version]);
    await this.db.query('UPDATE search_outbox SET claim_token = NULL, claimed_until = NULL WHERE claim_token = ?', [token]);
  }

  /** Keeps the rows for a later try; MariaDB applies SET left to right, so the backoff uses the new count. */
  async fail(token: string, message: string): Promise<void> {
    await this.db.query(
      `UPDATE search_outbox SET attempts = attempts + 1, last_error = ?,
         due_at = CURRENT_TIMESTAMP(3) + INTERVAL LEAST(${MAX_BACKOFF_SECONDS}, POW(2, attempts)) SECOND,
         claim_token = NULL, claimed_until = NULL
       WHERE claim_token = ?`,
      [message.slice(0, 500), token],
    );
  }

  async state(): Promise<OutboxState> {
    const rows = await this.db.query<{ pending: string; failing: string | null }[]>(
      'SELECT COUNT(*) AS pending, SUM(attempts > 0) AS failing FROM search_outbox',
    );
    const last = await this.db.query<{ last_error: string }[]>(
      'SELECT last_error FROM search_outbox WHERE last_error IS NOT NULL ORDER BY due_at DESC LIMIT 1',
    );
    return { pending: Number(rows[0]?.pending ?? 0), failing: Number(rows[0]?.failing ?? 0), lastError: last[0]?.last_error ?? null };
  }
}
