import { useMutation } from '@apollo/client/react';
import { useCallback, useEffect, useRef, useState } from 'react';

import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { trialsDocuments } from '../api/trials-documents.js';
import type { Trial } from '../api/types.js';
import { draftStore } from '../lib/draft-store.js';
import { draftToInput } from '../lib/draft-to-input.js';
import { changed, type TrialDraft } from '../lib/trial-draft.js';
import { useOnline } from './use-online.js';

/** A pause after the last tap before sending, so a burst of swings goes in one request. */
export const SEND_DELAY_MS = 1200;
/** After a failed send the next try waits this much longer each time, up to half a minute. */
const RETRY_STEP_MS = 2500;
const RETRY_MAX_MS = 30_000;

export interface TrialDraftControls {
  draft: TrialDraft;
  online: boolean;
  /** A change on the phone: saved here at once, sent when it can be. */
  update: (patch: Partial<TrialDraft>) => void;
  sendNow: () => void;
  /** After a conflict: overwrite the server's copy with this one. */
  keepMine: (serverVersion: number) => void;
  /** After a conflict: drop this copy and use the server's. */
  replaceWith: (draft: TrialDraft) => void;
}

/**
 * Holds a trial draft on the device and sends it to the server whenever it is complete and the
 * phone is online; one request at a time, and a resend after a lost answer says so.
 */
export function useTrialDraft(initial: TrialDraft, now: () => string = () => new Date().toISOString()): TrialDraftControls {
  const [draft, setDraft] = useState<TrialDraft>(() => {
    const stored = draftStore.load(initial.id) ?? initial;
    // A send cut off by a closed tab never answered: treat it as not sent.
    return stored.sync === 'sending' ? { ...stored, sync: 'unsent', unansweredToken: stored.saveToken } : stored;
  });
  const online = useOnline();
  const inFlight = useRef(false);
  const failures = useRef(0);
  const [save] = useMutation(trialsDocuments.saveTrial);

  useEffect(() => draftStore.save(draft), [draft]);

  const send = useCallback(
    async (current: TrialDraft) => {
      const check = draftToInput(current);
      if (!check.ok || inFlight.current) return;
      inFlight.current = true;
      const token = current.saveToken;
      setDraft((d) => (d.saveToken === token ? { ...d, sync: 'sending' } : d));
      try {
        const { data } = await save({ variables: { input: check.input } });
        const saved: Trial | undefined = data?.saveTrial;
        failures.current = 0;
        setDraft((d) => ({
          ...d,
          baseVersion: saved?.version ?? d.baseVersion,
          unansweredToken: null,
          ...(d.saveToken === token ? { sync: 'sent' as const, sentAt: now() } : {}),
        }));
      } catch (error) {
        const detail = graphQLErrorDetails(error)[0];
        if (detail?.code === 'NETWORK') failures.current += 1;
        setDraft((d) => {
          if (detail?.code === 'NETWORK') return { ...d, sync: 'unsent', unansweredToken: token };
          if (detail?.code === 'CONFLICT') return { ...d, sync: 'conflict', problem: detail.message };
          return { ...d, sync: 'refused', problem: graphQLErrorDetails(error).map((e) => e.message).join(' ') };
        });
      } finally {
        inFlight.current = false;
      }
    },
    [save, now],
  );

  useEffect(() => {
    if (draft.sync !== 'unsent' || !online) return undefined;
    const wait = failures.current === 0 ? SEND_DELAY_MS : Math.min(RETRY_MAX_MS, RETRY_STEP_MS * failures.current);
    const timer = window.setTimeout(() => void send(draft), wait);
    return () => window.clearTimeout(timer);
  }, [draft, online, send]);

  const update = useCallback((patch: Partial<TrialDraft>) => setDraft((d) => changed(d, patch, now())), [now]);
  const sendNow = useCallback(() => void send(draft), [draft, send]);
  const keepMine = useCallback((serverVersion: number) => setDraft((d) => changed(d, { baseVersion: serverVersion, unansweredToken: null }, now())), [now]);
  const replaceWith = useCallback((fresh: TrialDraft) => setDraft(fresh), []);
  return { draft, online, update, sendNow, keepMine, replaceWith };
}
