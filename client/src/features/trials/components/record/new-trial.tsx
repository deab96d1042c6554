import Alert from '@mui/material/Alert';
import { useEffect } from 'react';
import { useNavigate } from 'react-router';

import { PageLoading } from '../../../../components/ui/page-loading.js';
import { paths } from '../../../../config/paths.js';
import type { UnitPreference } from '../../api/types.js';
import { draftStore } from '../../lib/draft-store.js';
import { newDraft } from '../../lib/trial-draft.js';

/** Starts a draft on this phone and opens the recorder on it (the address then names the trial). */
export function NewTrial({ clubId, units }: { clubId: string | null; units: UnitPreference }) {
  const navigate = useNavigate();
  useEffect(() => {
    if (!clubId) return;
    const now = new Date();
    // The local calendar day, not the UTC one: a trial in the evening belongs to that evening.
    const today = new Date(now.getTime() - now.getTimezoneOffset() * 60_000).toISOString().slice(0, 10);
    const draft = newDraft(clubId, { today, units, now: now.toISOString() });
    draftStore.save(draft);
    void navigate(paths.recordTrial.href(draft.id), { replace: true });
  }, [clubId, units, navigate]);
  if (!clubId) return <Alert severity="error">Open a new trial from your club&apos;s trials list.</Alert>;
  return <PageLoading label="Starting a trial" />;
}
