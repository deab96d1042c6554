import { useParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { RecordTrial } from '../../../features/trials/components/record/record-trial.js';

export function RecordTrialPage() {
  const { trialId = '' } = useParams();
  const { user } = useAuth();
  return (
    <>
      <PageHeading compact>Record a trial</PageHeading>
      <RecordTrial key={trialId} trialId={trialId} units={user?.unitSystem ?? 'METRIC'} />
    </>
  );
}
