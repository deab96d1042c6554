import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { describe, expect, it } from '@jest/globals';

import type { EngineSnapshot } from './engine.js';
import { SnapshotStore } from './snapshot-store.js';

function snapshot(createdAt: string): EngineSnapshot {
  return { version: 1, createdAt, tasks: { nextUid: 3, tasks: [] }, indexes: [] };
}

describe('SnapshotStore', () => {
  it('loads nothing from an empty folder and what it wrote afterwards', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'snapshot-store-'));
    try {
      const store = new SnapshotStore(dir, () => snapshot('2026-03-04T00:00:00.000Z'));
      expect(store.load()).toBeNull();
      await store.flush();
      expect(store.load()).toEqual(snapshot('2026-03-04T00:00:00.000Z'));
      // The temp file was renamed over the snapshot, not left beside it.
      expect(readdirSync(dir)).toEqual(['snapshot.json']);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('writes once after a burst of changes, after the debounce', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'snapshot-store-'));
    let produced = 0;
    try {
      const store = new SnapshotStore(dir, () => {
        produced += 1;
        return snapshot('2026-03-04T00:00:00.000Z');
      }, 20);
      store.schedule();
      store.schedule();
      store.schedule();
      expect(produced).toBe(0);
      const deadline = Date.now() + 5000;
      while (store.load() === null && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 10));
      await new Promise((resolve) => setTimeout(resolve, 60));
      expect(produced).toBe(1);
      expect(store.load()?.tasks.nextUid).toBe(3);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
