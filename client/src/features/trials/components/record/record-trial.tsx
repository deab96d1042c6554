import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';

import { PageLoading } from '../../../../components/ui/page-loading.js';
import { graphQLErrorDetails } from '../../../../lib/graphql-error-details.js';
import { trialsDocuments } from '../../api/trials-documents.js';
import type { UnitPreference } from '../../api/types.js';
import { useTrialSetup } from '../../hooks/use-trial-setup.js';
import { draftStore } from '../../lib/draft-store.js';
import { draftFromTrial, type TrialDraft } from '../../lib/trial-draft.js';
import { TrialRecorder } from './trial-recorder.js';

/**
 * Opens the recorder on this phone's copy of a trial when it has unsent changes, otherwise on
 * the server's copy (so an edit starts from the latest version).
 */
export function RecordTrial({ trialId, units }: { trialId: string; units: UnitPreference }) {
  const local = draftStore.load(trialId);
  const useLocal = local !== null && local.sync !== 'sent';
  const server = useQuery(trialsDocuments.trial, { variables: { id: trialId }, skip: useLocal, fetchPolicy: 'network-only' });
  let initial: TrialDraft | null = useLocal ? local : null;
  if (!initial && server.data) initial = draftFromTrial(server.data.trial, { units, now: new Date().toISOString() });
  // Offline with a copy that was already sent: carry on from it.
  if (!initial && server.error && local) initial = local;
  const { setup, loading, error } = useTrialSetup(initial?.clubId ?? '');

  if (!initial) {
    if (server.error) {
      return (
        <Alert severity="error" role="alert">
          {graphQLErrorDetails(server.error)[0]?.message}
        </Alert>
      );
    }
    return <PageLoading label="Opening the trial" />;
  }
  if (error && !setup) {
    return (
      <Alert severity="error" role="alert">
        {graphQLErrorDetails(error)[0]?.message} The rack and roster are needed once, with a connection, before recording.
      </Alert>
    );
  }
  if (loading || !setup) return <PageLoading label="Loading the rack and roster" />;
  return <TrialRecorder key={initial.id} initial={initial} setup={setup} units={units} />;
}
