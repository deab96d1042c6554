import { useQuery } from '@apollo/client/react';
import { useEffect } from 'react';

import { trialsDocuments } from '../api/trials-documents.js';
import type { TrialSetup } from '../api/types.js';

const PREFIX = 'endgrain.trial-setup.';

function cached(clubId: string): TrialSetup | null {
  try {
    const raw = window.localStorage.getItem(PREFIX + clubId);
    return raw ? (JSON.parse(raw) as TrialSetup) : null;
  } catch {
    return null;
  }
}

/**
 * The club's rack and roster for the recorder; the last copy is kept on the phone, so a trial can
 * be started where there is no signal once the page has been opened with one.
 */
export function useTrialSetup(clubId: string): { setup: TrialSetup | null; loading: boolean; error: unknown } {
  const { data, loading, error } = useQuery(trialsDocuments.trialSetup, { variables: { clubId }, skip: !clubId });
  useEffect(() => {
    if (data) window.localStorage.setItem(PREFIX + clubId, JSON.stringify(data.trialSetup));
  }, [data, clubId]);
  const setup = data?.trialSetup ?? (error ? cached(clubId) : null);
  return { setup, loading: loading && !setup, error: setup ? undefined : error };
}
