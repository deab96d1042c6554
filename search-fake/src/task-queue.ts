import { ApiError, type ErrorBody } from './api-error.js';

export type TaskStatus = 'enqueued' | 'processing' | 'succeeded' | 'failed' | 'canceled';

export interface Task {
  uid: number;
  batchUid: number | null;
  indexUid: string | null;
  status: TaskStatus;
  type: string;
  canceledBy: null;
  details: Record<string, unknown>;
  error: ErrorBody | null;
  duration: string | null;
  enqueuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

export interface EnqueuedTask {
  taskUid: number;
  indexUid: string | null;
  status: 'enqueued';
  type: string;
  enqueuedAt: string;
}

/** The write itself; returns details to add (counts), or throws an ApiError to fail the task. */
export type TaskWork = () => Record<string, unknown> | void;

export interface TaskQueueSnapshot {
  nextUid: number;
  tasks: Task[];
}

const MEMORY_LIMIT = 10_000;
const SNAPSHOT_LIMIT = 1_000;

/**
 * Tasks with ids sequential across the instance, run one at a time after a short delay, never
 * inside the request that enqueued them: a caller that does not wait sees the old state.
 */
export class TaskQueue {
  private readonly tasks = new Map<number, Task>();
  private readonly pending: { task: Task; work: TaskWork }[] = [];
  private nextUid = 0;
  private timer: NodeJS.Timeout | null = null;
  private running = false;
  private stopped = false;

  constructor(private readonly options: { delayMs: number; onSettled: () => void }) {}

  enqueue(type: string, indexUid: string | null, details: Record<string, unknown>, work: TaskWork): EnqueuedTask {
    const task: Task = {
      uid: this.nextUid, batchUid: null, indexUid, status: 'enqueued', type, canceledBy: null, details,
      error: null, duration: null, enqueuedAt: new Date().toISOString(), startedAt: null, finishedAt: null,
    };
    this.nextUid += 1;
    this.tasks.set(task.uid, task);
    this.pending.push({ task, work });
    this.prune();
    this.schedule();
    return { taskUid: task.uid, indexUid, status: 'enqueued', type, enqueuedAt: task.enqueuedAt };
  }

  get(uid: number): Task | undefined {
    return this.tasks.get(uid);
  }

  /** Newest first, as the service lists them. */
  all(): Task[] {
    return [...this.tasks.values()].reverse();
  }

  /** Runs every waiting task now: used on shutdown so no acknowledged write is lost. */
  drain(): void {
    this.stop();
    while (this.pending.length > 0) this.runNext(true);
  }

  /** No more timers; pending work runs only through `drain`. */
  stop(): void {
    this.stopped = true;
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
  }

  toSnapshot(): TaskQueueSnapshot {
    const finished = [...this.tasks.values()].filter((task) => task.status !== 'enqueued' && task.status !== 'processing');
    return { nextUid: this.nextUid, tasks: finished.slice(-SNAPSHOT_LIMIT) };
  }

  restore(snapshot: TaskQueueSnapshot): void {
    this.nextUid = snapshot.nextUid;
    for (const task of snapshot.tasks) this.tasks.set(task.uid, task);
  }

  private schedule(): void {
    if (this.stopped || this.timer !== null || this.running || this.pending.length === 0) return;
    const head = this.pending[0] as { task: Task };
    const wait = Math.max(0, Date.parse(head.task.enqueuedAt) + this.options.delayMs - Date.now());
    this.timer = setTimeout(() => {
      this.timer = null;
      this.runNext(false);
    }, wait);
    // The HTTP server keeps a running fake alive; a forgotten close() in a test should not.
    this.timer.unref();
  }

  private runNext(now: boolean): void {
    const next = this.pending[0];
    if (next === undefined) return;
    const { task } = next;
    task.status = 'processing';
    task.startedAt = new Date().toISOString();
    task.batchUid = task.uid;
    if (now) {
      this.finish();
      return;
    }
    this.running = true;
    // One turn of the event loop in `processing`, so that state is observable as in production.
    setImmediate(() => {
      this.running = false;
      if (this.pending[0] === next) this.finish();
      this.schedule();
    });
  }

  private finish(): void {
    const entry = this.pending.shift();
    if (entry === undefined) return;
    const { task, work } = entry;
    const started = performance.now();
    try {
      Object.assign(task.details, work() ?? {});
      task.status = 'succeeded';
    } catch (error) {
      const apiError = ApiError.from(error);
      task.status = 'failed';
      task.error = apiError.toBody();
      for (const key of ['indexedDocuments', 'deletedDocuments']) if (task.details[key] === null) task.details[key] = 0;
    }
    task.finishedAt = new Date().toISOString();
    task.duration = `PT${((performance.now() - started) / 1000).toFixed(6)}S`;
    this.options.onSettled();
  }

  private prune(): void {
    for (const uid of this.tasks.keys()) {
      if (this.tasks.size <= MEMORY_LIMIT) break;
      const task = this.tasks.get(uid) as Task;
      if (task.status === 'enqueued' || task.status === 'processing') break;
      this.tasks.delete(uid);
    }
  }
}
