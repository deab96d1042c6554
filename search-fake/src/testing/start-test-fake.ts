import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { afterAll, beforeAll } from '@jest/globals';
import { Meilisearch } from 'meilisearch';

import { startSearchFake, type SearchFake, type SearchFakeOptions } from '../server.js';

export const TEST_MASTER_KEY = 'test-master-key-for-contract-tests';

export interface TestFake {
  fake: SearchFake;
  client: Meilisearch;
  dataDir: string;
  /** A client for the same fake with another key (or none). */
  clientWith(apiKey: string | undefined): Meilisearch;
  /** Closes and starts again on the same data folder, as a restart would. */
  restart(): Promise<void>;
  stop(): Promise<void>;
}

/** The fake on a free port with a fresh temp data folder, and an SDK client holding the master key. */
export async function startTestFake(options: Omit<SearchFakeOptions, 'port' | 'dataDir'> = {}): Promise<TestFake> {
  const dataDir = mkdtempSync(join(tmpdir(), 'search-fake-test-'));
  const launch = (): Promise<SearchFake> => startSearchFake({ masterKey: TEST_MASTER_KEY, ...options, port: 0, dataDir });
  const state: TestFake = {
    fake: await launch(),
    client: undefined as unknown as Meilisearch,
    dataDir,
    clientWith: (apiKey) => new Meilisearch({ host: state.fake.url, apiKey }),
    async restart() {
      await state.fake.close();
      state.fake = await launch();
      state.client = state.clientWith(TEST_MASTER_KEY);
    },
    async stop() {
      await state.fake.close();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
  state.client = state.clientWith(TEST_MASTER_KEY);
  return state;
}

/** Starts one fake for the whole test file and stops it after; call the result to reach it. */
export function useTestFake(options: Omit<SearchFakeOptions, 'port' | 'dataDir'> = {}): () => TestFake {
  let started: TestFake | undefined;
  beforeAll(async () => {
    started = await startTestFake(options);
  });
  afterAll(async () => {
    await started?.stop();
  });
  return () => {
    if (started === undefined) throw new Error('the test fake is not started yet');
    return started;
  };
}

/** Runs an SDK call that should fail and returns the thrown error, or fails the test if it succeeds. */
export async function rejection(call: Promise<unknown>): Promise<{ cause?: { code?: string; message?: string; type?: string }; response?: { status: number }; name: string }> {
  try {
    await call;
  } catch (error) {
    return error as never;
  }
  throw new Error('expected the call to be refused, but it succeeded');
}
