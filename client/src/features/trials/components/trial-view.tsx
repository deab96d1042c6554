import { useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import { useTheme } from '@mui/material/styles';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { Link as RouterLink } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { trialsDocuments } from '../api/trials-documents.js';
import type { Trial, UnitPreference } from '../api/types.js';
import { formatDiameter, localiseRecommendation } from '../lib/depth-format.js';
import { DepthChart } from './depth-chart.js';
import { LoadFailed } from './load-failed.js';
import { FrozenWoodNote } from './frozen-wood-note.js';
import { RankingList } from './ranking-list.js';
import { RankingTable } from './ranking-table.js';
import { TesterEffects } from './tester-effects.js';
import { TrialActions } from './trial-actions.js';
import { TrialCautions } from './trial-cautions.js';

function blockLine(trial: Trial, units: UnitPreference): string {
  return [
    `${formatDiameter(trial.diameterMm, units)} ${trial.woodLabel}`,
    trial.knots && `knots: ${trial.knots}`,
    trial.faceUsed && `face: ${trial.faceUsed}`,
    trial.airTempC !== null && `air ${trial.airTempC} °C`,
  ]
    .filter(Boolean)
    .join(' · ');
}

/** A trial's page: the recommendation in words, the ranking, the depth chart and the caveats. */
export function TrialView({ trialId, units }: { trialId: string; units: UnitPreference }) {
  const { data, loading, error, refetch } = useQuery(trialsDocuments.trial, { variables: { id: trialId } });
  const theme = useTheme();
  const narrow = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  if (error) return <LoadFailed error={error} onRetry={() => void refetch()} />;
  if (loading && !data) return <PageLoading label="Loading the trial" />;
  const trial = data!.trial;
  const title = `Trial: ${trial.woodLabel}`;
  return (
    <Stack spacing={3} sx={{ maxWidth: 900 }}>
      <div>
        <Button component={RouterLink} to={paths.trialsOfClub.href(trial.clubId)} size="small">
          ← {trial.clubName} trials
        </Button>
        <PageHeading lead={`${trial.testedOn} · ${blockLine(trial, units)} · reference ${trial.referenceAxeLabel} · testers ${trial.testers.map((t) => t.name).join(', ')}`}>
          {title}
        </PageHeading>
      </div>
      {trial.frozenWarning && <FrozenWoodNote />}
      <Paper variant="outlined" sx={{ p: 2, borderLeftWidth: 6, borderLeftColor: 'primary.main' }} component="section" aria-label="Recommendation">
        <Typography variant="overline" component="h2">
          Recommendation
        </Typography>
        <Typography>{localiseRecommendation(trial.recommendation, units)}</Typography>
      </Paper>
      {trial.ranking.length === 0 ? (
        <Alert severity="info">
          No axe has been swung on this block yet.{trial.canEdit && ' Open it on your phone beside the block and add the first axe.'}
        </Alert>
      ) : (
        <>
          <Stack component="section" spacing={1} aria-labelledby="ranking-heading">
            <Typography id="ranking-heading" variant="h2" sx={{ fontSize: '1.25rem' }}>
              Ranking
            </Typography>
            {narrow ? <RankingList rows={trial.ranking} units={units} /> : <RankingTable rows={trial.ranking} units={units} />}
            <Typography variant="body2" color="text.secondary">
              Places go by depth per counted swing; an axe that binds (release 1 or 2) is placed after every axe that comes out free, and is flagged when it cut deeper.
            </Typography>
          </Stack>
          <Stack component="section" spacing={1} aria-labelledby="chart-heading">
            <Typography id="chart-heading" variant="h2" sx={{ fontSize: '1.25rem' }}>
              Depth per swing
            </Typography>
            <DepthChart runs={trial.runs} units={units} />
          </Stack>
          <TesterEffects effects={trial.testerEffects} units={units} />
        </>
      )}
      {trial.notes && <Typography>{trial.notes}</Typography>}
      {trial.canEdit && <TrialActions trial={trial} />}
      <TrialCautions />
    </Stack>
  );
}
