import { describe, expect, it } from '@jest/globals';
import { MockedProvider } from '@apollo/client/testing/react';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';

import { trialsDocuments } from '../api/trials-documents.js';
import { draftStore } from '../lib/draft-store.js';
import { draftToInput } from '../lib/draft-to-input.js';
import { completeDraft, testTrial } from '../testing/trial-fixtures.js';
import type { TrialDraft } from '../lib/trial-draft.js';
import { useTrialDraft } from './use-trial-draft.js';

const inputOf = (draft: TrialDraft) => {
  const check = draftToInput(draft);
  if (!check.ok) throw new Error('incomplete test draft');
  return check.input;
};

const saveMock = (draft: TrialDraft, reply: { version?: number; error?: Error; code?: string }) => ({
  request: { query: trialsDocuments.saveTrial, variables: { input: inputOf(draft) } },
  ...(reply.error
    ? { error: reply.error }
    : reply.code
      ? { result: { errors: [{ message: 'This trial was changed on another device since you opened it; reload it before saving again.', extensions: { code: reply.code } }] } }
      : { result: { data: { saveTrial: testTrial({ version: reply.version ?? 1 }) } } }),
});

function wrapperWith(mocks: ReturnType<typeof saveMock>[]) {
  return ({ children }: { children: ReactNode }) => <MockedProvider mocks={mocks}>{children}</MockedProvider>;
}

describe('useTrialDraft', () => {
  it('keeps the draft on the phone and sends it once it is complete', async () => {
    const draft = completeDraft();
    const { result } = renderHook(() => useTrialDraft(draft), { wrapper: wrapperWith([saveMock(draft, { version: 1 })]) });
    expect(draftStore.load(draft.id)?.sync).toBe('unsent');
    await waitFor(() => expect(result.current.draft.sync).toBe('sent'), { timeout: 4000 });
    expect(result.current.draft.baseVersion).toBe(1);
    expect(draftStore.load(draft.id)?.sync).toBe('sent');
  });

  it('after a lost answer, resends naming the token it never heard back about', async () => {
    const draft = completeDraft();
    const retry = { ...draft, unansweredToken: draft.saveToken };
    const { result } = renderHook(() => useTrialDraft(draft), {
      wrapper: wrapperWith([saveMock(draft, { error: new Error('Failed to fetch') }), saveMock(retry, { version: 1 })]),
    });
    await waitFor(() => expect(result.current.draft.unansweredToken).toBe(draft.saveToken), { timeout: 4000 });
    expect(result.current.draft.sync).toBe('unsent');
    // The second attempt (2.5 s later) carries unansweredToken; the mock only answers that exact input.
    await waitFor(() => expect(result.current.draft.sync).toBe('sent'), { timeout: 6000 });
    expect(result.current.draft.unansweredToken).toBeNull();
  });

  it('stops and says so when another device saved a newer version', async () => {
    const draft = completeDraft({ baseVersion: 1 });
    const { result } = renderHook(() => useTrialDraft(draft), { wrapper: wrapperWith([saveMock(draft, { code: 'CONFLICT' })]) });
    await waitFor(() => expect(result.current.draft.sync).toBe('conflict'), { timeout: 4000 });
    expect(result.current.draft.problem).toMatch(/changed on another device/);
    // Keeping this copy rebases it on the server's version and sends again.
    act(() => result.current.keepMine(2));
    expect(result.current.draft).toMatchObject({ sync: 'unsent', baseVersion: 2 });
  });

  it('does not send a draft that still lacks its block', async () => {
    const draft = completeDraft({ speciesId: '' });
    const { result } = renderHook(() => useTrialDraft(draft), { wrapper: wrapperWith([]) });
    await new Promise((r) => setTimeout(r, 1500));
    expect(result.current.draft.sync).toBe('unsent');
  });
});
