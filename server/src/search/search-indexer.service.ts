import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';

import { applyKnowledgeSettings, knowledgeDocumentCount, writeKnowledgeDocuments } from './knowledge-index.js';
import { SearchOutboxRepository, type OutboxRow } from './search-outbox.repository.js';
import type { SearchSource } from './search-source.js';
import { SearchService } from './search.service.js';

/** How often the outbox is looked at even when nothing kicked it (retries, other servers' rows). */
export const DRAIN_INTERVAL_MS = 5000;
const BATCH = 100;

/**
 * Keeps the search index in step with the database through the outbox: drained right after a
 * change and on an interval; failures are logged and retried, never thrown at the writer.
 */
@Injectable()
export class SearchIndexer implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('Search');
  private readonly sources = new Map<string, SearchSource>();
  private running: Promise<void> | null = null;
  private startup: Promise<void> | null = null;
  private again = false;
  private stopped = false;
  private settingsApplied = false;
  private timer: NodeJS.Timeout | null = null;

  constructor(
    @Inject(SearchService) private readonly searchService: SearchService,
    @Inject(SearchOutboxRepository) private readonly outbox: SearchOutboxRepository,
  ) {}

  register(source: SearchSource): void {
    this.sources.set(source.type, source);
  }

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => this.kick(), DRAIN_INTERVAL_MS);
    this.timer.unref();
    this.startup = this.reindexIfEmpty();
  }

  async onModuleDestroy(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.startup;
    await this.running;
  }

  /** Starts a drain unless one runs (then it goes round once more). Never throws. */
  kick(): void {
    if (this.stopped) return;
    if (this.running) {
      this.again = true;
      return;
    }
    this.running = this.drainLoop().finally(() => {
      this.running = null;
    });
  }

  /** Drains now and resolves when the outbox has been worked through once (tests, the CLI). */
  async drain(): Promise<void> {
    this.kick();
    await this.running;
  }

  private async drainLoop(): Promise<void> {
    do {
      this.again = false;
      try {
        while ((await this.drainOnce()) === BATCH && !this.stopped);
      } catch (error) {
        this.logger.warn(`search outbox not drained: ${message(error)}`);
      }
    } while (this.again && !this.stopped);
  }

  /** Sends one batch; answers how many rows it took. */
  private async drainOnce(): Promise<number> {
    const { token, rows } = await this.outbox.claim(BATCH);
    if (rows.length === 0) return 0;
    try {
      await this.send(rows);
      await this.outbox.finish(token, rows);
    } catch (error) {
      this.logger.warn(`indexing ${rows.length} document(s) failed, will retry: ${message(error)}`);
      await this.outbox.fail(token, message(error));
    }
    return rows.length;
  }

  private async send(rows: OutboxRow[]): Promise<void> {
    const client = this.searchService.client;
    if (!this.settingsApplied) {
      await applyKnowledgeSettings(client);
      this.settingsApplied = true;
    }
    for (const [type, ids] of groupByType(rows)) {
      const source = this.sources.get(type);
      if (!source) throw new Error(`no search source registered for "${type}"`);
      const { documents, gone } = await source.documents(ids);
      await writeKnowledgeDocuments(client, documents, gone);
    }
  }

  /** A fresh or wiped search service gets everything again; the outbox does the sending. */
  private async reindexIfEmpty(): Promise<void> {
    try {
      if ((await knowledgeDocumentCount(this.searchService.client)) > 0) return;
      for (const source of this.sources.values()) await this.outbox.enqueue(null, source.type, await source.allIds());
      this.logger.log('search index is empty: queued every published document');
      this.kick();
    } catch (error) {
      this.logger.warn(`start-up index check skipped: ${message(error)}`);
    }
  }
}

function groupByType(rows: OutboxRow[]): Map<string, string[]> {
  const groups = new Map<string, string[]>();
  for (const row of rows) groups.set(row.docType, [...(groups.get(row.docType) ?? []), row.docId]);
  return groups;
}

function message(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
