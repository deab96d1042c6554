import Stack from '@mui/material/Stack';
import { useParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { AthleteProfile } from '../../../features/clubs/components/athlete-profile.js';
import { AthleteResultsSection } from '../../../features/results/components/athlete-results-section.js';

export function AthletePage() {
  const { athleteId = '' } = useParams();
  const { user } = useAuth();
  return (
    <Stack spacing={4} key={athleteId}>
      <AthleteProfile athleteId={athleteId} />
      <AthleteResultsSection athleteId={athleteId} units={user?.unitSystem ?? 'METRIC'} />
    </Stack>
  );
}
