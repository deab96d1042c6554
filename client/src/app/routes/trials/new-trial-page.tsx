import { useSearchParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { NewTrial } from '../../../features/trials/components/record/new-trial.js';

export function NewTrialPage() {
  const [params] = useSearchParams();
  const { user } = useAuth();
  return <NewTrial clubId={params.get('club')} units={user?.unitSystem ?? 'METRIC'} />;
}
