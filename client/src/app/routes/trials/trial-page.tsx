import { useParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { TrialView } from '../../../features/trials/components/trial-view.js';

export function TrialPage() {
  const { trialId = '' } = useParams();
  const { user } = useAuth();
  // The page title comes from the trial's own heading inside the view.
  return <TrialView key={trialId} trialId={trialId} units={user?.unitSystem ?? 'METRIC'} />;
}
