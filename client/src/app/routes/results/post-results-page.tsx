import { useParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { PostResultsView } from '../../../features/results/components/post-results-view.js';

export function PostResultsPage() {
  const { meetId = '' } = useParams();
  const { user } = useAuth();
  return <PostResultsView key={meetId} meetId={meetId} units={user?.unitSystem ?? 'METRIC'} />;
}
