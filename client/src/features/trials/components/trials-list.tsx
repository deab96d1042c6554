import { useQuery } from '@apollo/client/react';
import Add from '@mui/icons-material/Add';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { trialsDocuments } from '../api/trials-documents.js';
import type { TrialListItem, UnitPreference } from '../api/types.js';
import { formatDiameter } from '../lib/depth-format.js';
import { draftStore } from '../lib/draft-store.js';
import { conditionLabel } from '../lib/trial-words.js';
import { LoadFailed } from './load-failed.js';

function TrialCard({ trial, units }: { trial: TrialListItem; units: UnitPreference }) {
  const title = `${conditionLabel(trial.condition)} ${trial.speciesName}, ${formatDiameter(trial.diameterMm, units)}`;
  return (
    <Paper component="li" variant="outlined" sx={{ p: 2 }}>
      <Link component={RouterLink} to={paths.trial.href(trial.id)} variant="subtitle1" sx={{ fontWeight: 600 }}>
        {title}
      </Link>
      <Typography variant="body2" color="text.secondary">
        {trial.testedOn} · {trial.axeCount} axe{trial.axeCount === 1 ? '' : 's'} · reference {trial.referenceAxeLabel}
      </Typography>
      <Stack direction="row" spacing={1} sx={{ mt: 1, alignItems: 'center' }}>
        <Typography variant="body2">{trial.leaderLabel ? `1st: ${trial.leaderLabel}` : 'No counted swings yet'}</Typography>
        {trial.published && <Chip size="small" label="Published" color="success" variant="outlined" />}
      </Stack>
    </Paper>
  );
}

/** A club's trials, newest first, and the drafts this phone has not sent yet. */
export function TrialsList({ clubId, units }: { clubId: string; units: UnitPreference }) {
  const { data, loading, error, refetch } = useQuery(trialsDocuments.trials, { variables: { clubId } });
  const drafts = draftStore.unsent(clubId);
  if (error) return <LoadFailed error={error} onRetry={() => void refetch()} />;
  if (loading && !data) return <PageLoading label="Loading trials" />;
  const list = data!.trials;
  return (
    <Stack spacing={3}>
      {list.canRecord && (
        <Button component={RouterLink} to={paths.newTrial.href(clubId)} variant="contained" size="large" startIcon={<Add />} sx={{ alignSelf: 'flex-start' }}>
          New trial
        </Button>
      )}
      {drafts.length > 0 && (
        <Alert severity="warning" role="status">
          <Typography sx={{ fontWeight: 600 }}>Kept on this phone, not sent yet</Typography>
          <Stack component="ul" sx={{ m: 0, pl: 2.5 }}>
            {drafts.map((d) => (
              <li key={d.id}>
                <Link component={RouterLink} to={paths.recordTrial.href(d.id)}>
                  Trial of {d.testedOn} ({d.runs.length} axe run{d.runs.length === 1 ? '' : 's'})
                </Link>
              </li>
            ))}
          </Stack>
        </Alert>
      )}
      {list.trials.length === 0 ? (
        <Typography color="text.secondary">
          {list.canRecord
            ? 'No trials yet. Take a phone to the block, press New trial, and record each axe as it is swung.'
            : 'No trials yet. When your coaches record one, it shows here with its ranking.'}
        </Typography>
      ) : (
        <Stack component="ul" spacing={1.5} sx={{ p: 0, m: 0, listStyle: 'none' }} aria-label={`${list.clubName} trials`}>
          {list.trials.map((t) => (
            <TrialCard key={t.id} trial={t} units={units} />
          ))}
        </Stack>
      )}
    </Stack>
  );
}
