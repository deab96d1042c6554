import { describe, expect, it } from '@jest/globals';

import { ApiError } from './api-error.js';
import { TaskQueue } from './task-queue.js';

/** Polls until the condition holds, so a loaded machine slows the test but does not fail it. */
async function until(condition: () => boolean): Promise<void> {
  const deadline = Date.now() + 5000;
  while (!condition()) {
    if (Date.now() > deadline) throw new Error('condition not met within 5 s');
    await new Promise((resolve) => setTimeout(resolve, 5));
  }
}

describe('TaskQueue', () => {
  it('never runs the work inside enqueue, and runs tasks in order', async () => {
    const ran: number[] = [];
    const queue = new TaskQueue({ delayMs: 0, onSettled: () => undefined });
    const a = queue.enqueue('documentAdditionOrUpdate', 'x', {}, () => void ran.push(0));
    const b = queue.enqueue('documentAdditionOrUpdate', 'x', {}, () => void ran.push(1));
    expect(ran).toEqual([]);
    expect([a.taskUid, b.taskUid]).toEqual([0, 1]);
    await until(() => queue.get(1)?.status === 'succeeded');
    expect(ran).toEqual([0, 1]);
  });

  it('records a thrown ApiError as a failed task with the error body', async () => {
    const queue = new TaskQueue({ delayMs: 0, onSettled: () => undefined });
    queue.enqueue('indexCreation', 'x', {}, () => {
      throw new ApiError('index_already_exists', 'Index `x` already exists.');
    });
    await until(() => queue.get(0)?.status === 'failed');
    expect(queue.get(0)).toMatchObject({ status: 'failed', error: { code: 'index_already_exists', type: 'invalid_request' } });
  });

  it('runs everything still waiting on drain', () => {
    const ran: string[] = [];
    const queue = new TaskQueue({ delayMs: 10_000, onSettled: () => undefined });
    queue.enqueue('settingsUpdate', 'x', {}, () => void ran.push('settings'));
    queue.drain();
    expect(ran).toEqual(['settings']);
    expect(queue.get(0)?.status).toBe('succeeded');
  });

  it('carries task numbering over through a snapshot', () => {
    const queue = new TaskQueue({ delayMs: 0, onSettled: () => undefined });
    queue.enqueue('indexCreation', 'x', {}, () => undefined);
    queue.drain();
    const restored = new TaskQueue({ delayMs: 0, onSettled: () => undefined });
    restored.restore(queue.toSnapshot());
    restored.stop();
    expect(restored.enqueue('indexDeletion', 'x', {}, () => undefined).taskUid).toBe(1);
    expect(restored.get(0)?.status).toBe('succeeded');
  });
});
