import { useQuery } from '@apollo/client/react';
import Link from '@mui/material/Link';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';

import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { AXE_TRIALS, type AxeTrialsData } from '../api/axe-trials-document.js';

/** The trials that tested this axe, for the club's members; others are told why it is empty. */
export function AxeTrials({ axeId }: { axeId: string }) {
  const { data, loading, error } = useQuery<AxeTrialsData>(AXE_TRIALS, { variables: { axeId } });
  if (loading) return <Typography sx={{ color: 'text.secondary' }}>Loading trials…</Typography>;
  if (error) {
    const forbidden = graphQLErrorDetails(error).some((d) => d.code === 'FORBIDDEN' || d.code === 'UNAUTHENTICATED');
    return (
      <Typography sx={{ color: 'text.secondary' }}>
        {forbidden ? "Trials are shown to the club's members." : 'Trials could not be loaded; try again shortly.'}
      </Typography>
    );
  }
  const trials = data?.axeTrials ?? [];
  if (trials.length === 0) {
    return <Typography sx={{ color: 'text.secondary' }}>No trials with this axe yet. Record one from Trials beside the block.</Typography>;
  }
  return (
    <List dense disablePadding>
      {trials.map((t) => (
        <ListItem key={t.trialId} disableGutters>
          <ListItemText
            primary={
              <Link component={RouterLink} to={paths.trial.href(t.trialId)}>
                {t.testedOn}: {t.woodLabel}
              </Link>
            }
            secondary={t.isReference ? `Reference axe among ${t.axeCount}` : t.verdictPlace ? `Placed ${t.verdictPlace} of ${t.axeCount}` : `${t.axeCount} axes tested`}
          />
        </ListItem>
      ))}
    </List>
  );
}
