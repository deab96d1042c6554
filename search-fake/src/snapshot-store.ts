import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { rename, writeFile } from 'node:fs/promises';
import { join } from 'node:path';

import type { EngineSnapshot } from './engine.js';

const FILE_NAME = 'snapshot.json';

/**
 * Keeps the whole state in one JSON file. Writes are debounced after changes and always
 * atomic (temp file, then rename), so a crash mid-write leaves the previous snapshot whole.
 */
export class SnapshotStore {
  private readonly file: string;
  private timer: NodeJS.Timeout | null = null;
  private writing: Promise<void> | null = null;
  private dirty = false;

  constructor(dataDir: string, private readonly produce: () => EngineSnapshot, private readonly debounceMs = 200) {
    mkdirSync(dataDir, { recursive: true });
    this.file = join(dataDir, FILE_NAME);
  }

  get path(): string {
    return this.file;
  }

  load(): EngineSnapshot | null {
    let text: string;
    try {
      text = readFileSync(this.file, 'utf8');
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw error;
    }
    const snapshot = JSON.parse(text) as EngineSnapshot;
    if (snapshot.version !== 1) throw new Error(`${this.file}: unknown snapshot version ${String(snapshot.version)}`);
    return snapshot;
  }

  /** Asks for a write soon; many changes in a burst make one write. */
  schedule(): void {
    this.dirty = true;
    if (this.timer !== null) return;
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.writeAsync();
    }, this.debounceMs);
    this.timer.unref();
  }

  /** Writes now, after any write already under way; used on close. */
  async flush(): Promise<void> {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
    if (this.writing !== null) await this.writing;
    this.writeSync();
  }

  private writeSync(): void {
    const temp = `${this.file}.${process.pid}.tmp`;
    writeFileSync(temp, JSON.stringify(this.produce()));
    renameSync(temp, this.file);
    this.dirty = false;
  }

  private async writeAsync(): Promise<void> {
    if (this.writing !== null || !this.dirty) return;
    this.dirty = false;
    const temp = `${this.file}.${process.pid}.tmp`;
    this.writing = writeFile(temp, JSON.stringify(this.produce())).then(() => rename(temp, this.file));
    try {
      await this.writing;
    } catch (error) {
      this.dirty = true;
      process.stderr.write(`search-fake: snapshot not written: ${(error as Error).message}\n`);
    } finally {
      this.writing = null;
    }
    if (this.dirty) this.schedule();
  }
}
