import { useParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { MeetView } from '../../../features/meets/components/meet-view.js';

export function MeetPage() {
  const { meetId = '' } = useParams();
  const { user } = useAuth();
  // The page title comes from the meet's own heading inside the view.
  return (
    <MeetView
      key={meetId}
      meetId={meetId}
      units={user?.unitSystem ?? 'METRIC'}
      ownClubIds={user?.clubs.map((membership) => membership.clubId) ?? []}
    />
  );
}
