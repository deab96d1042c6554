import type { GrainComputation } from './grain-map-compute.js';
import type { RowsStamp } from './insights-rows.js';

const LIMIT = 64;

/**
 * Computed maps keyed by filter, each kept with the change stamp of the rows it came from.
 * A hit needs the stamp to be unchanged, so a corrected, added or deleted result (its
 * updated_at or the row count moves), a meet published or withdrawn, or a new trial all
 * force a recompute: the cache can be stale only for the length of one request.
 */
export class GrainMapCache {
  private readonly entries = new Map<string, { stamp: string; value: Promise<GrainComputation> }>();

  get(key: string, stamp: RowsStamp, compute: () => Promise<GrainComputation>): Promise<GrainComputation> {
    const stampKey = JSON.stringify(stamp);
    const hit = this.entries.get(key);
    if (hit !== undefined && hit.stamp === stampKey) {
      // Re-insert so the least recently used entry is the first to go.
      this.entries.delete(key);
      this.entries.set(key, hit);
      return hit.value;
    }
    const value = compute();
    value.catch(() => this.entries.delete(key));
    this.entries.set(key, { stamp: stampKey, value });
    while (this.entries.size > LIMIT) this.entries.delete(this.entries.keys().next().value!);
    return value;
  }

  clear(): void {
    this.entries.clear();
  }
}
