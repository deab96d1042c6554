import { useParams, useSearchParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { LineupView } from '../../../features/rack/components/lineup-view.js';

export function LineupPage() {
  const { meetId = '' } = useParams();
  const [params] = useSearchParams();
  const { user } = useAuth();
  const clubId = params.get('club') ?? user?.clubs[0]?.clubId ?? '';
  return <LineupView key={`${meetId}:${clubId}`} meetId={meetId} clubId={clubId} />;
}
