import { useMutation } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';

import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { trialsDocuments } from '../api/trials-documents.js';
import type { Trial } from '../api/types.js';
import { draftStore } from '../lib/draft-store.js';

/** What a club's coach can do with a trial: edit it on this phone, publish it as a finding, delete it. */
export function TrialActions({ trial }: { trial: Trial }) {
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string>();
  const [confirming, setConfirming] = useState(false);
  const [publish, publishing] = useMutation(trialsDocuments.publishTrialFinding, {
    refetchQueries: [{ query: trialsDocuments.trial, variables: { id: trial.id } }],
    awaitRefetchQueries: true,
  });
  const [remove, removing] = useMutation(trialsDocuments.deleteTrial);

  const run = async (action: () => Promise<unknown>) => {
    setProblem(undefined);
    try {
      await action();
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((d) => d.message).join(' '));
    }
  };
  const deleteTrial = () =>
    run(async () => {
      await remove({ variables: { id: trial.id } });
      draftStore.remove(trial.id);
      await navigate(paths.trialsOfClub.href(trial.clubId), { replace: true });
    });

  return (
    <Stack spacing={1.5}>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button variant="contained" component={RouterLink} to={paths.recordTrial.href(trial.id)}>
          Edit on this phone
        </Button>
        <Button variant="outlined" onClick={() => void run(() => publish({ variables: { trialId: trial.id } }))} loading={publishing.loading}>
          {trial.finding ? 'Publish again' : 'Publish as a finding'}
        </Button>
        {!confirming && (
          <Button color="error" onClick={() => setConfirming(true)}>
            Delete trial
          </Button>
        )}
      </Stack>
      {confirming && (
        <Alert
          severity="warning"
          role="alert"
          action={
            <Stack direction="row" spacing={1}>
              <Button color="error" variant="contained" onClick={() => void deleteTrial()} loading={removing.loading}>
                Delete
              </Button>
              <Button color="inherit" onClick={() => setConfirming(false)}>
                Keep
              </Button>
            </Stack>
          }
        >
          Delete this trial and its {trial.runs.length} axe runs? This cannot be undone.
        </Alert>
      )}
      {trial.finding && (
        <Alert severity="success">
          Published as a finding for the knowledge base.{' '}
          {trial.finding.fieldNoteSlug && (
            <Link component={RouterLink} to={paths.fieldNote.href(trial.finding.fieldNoteSlug, { draft: true })}>
              Open the draft Field Note
            </Link>
          )}
        </Alert>
      )}
      {problem && (
        <Alert severity="error" role="alert">
          {problem}
        </Alert>
      )}
    </Stack>
  );
}
