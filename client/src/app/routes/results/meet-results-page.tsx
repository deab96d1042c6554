import Stack from '@mui/material/Stack';
import { useParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { MeetResultsView } from '../../../features/results/components/meet-results-view.js';
import { MeetStandingsPanel } from '../../../features/standings/components/meet-standings-panel.js';

export function MeetResultsPage() {
  const { meetId = '' } = useParams();
  const { user } = useAuth();
  return (
    <Stack spacing={4} key={meetId}>
      <MeetResultsView meetId={meetId} units={user?.unitSystem ?? 'METRIC'} />
      <MeetStandingsPanel meetId={meetId} />
    </Stack>
  );
}
