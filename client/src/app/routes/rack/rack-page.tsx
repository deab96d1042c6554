import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { RackView } from '../../../features/rack/components/rack-view.js';

export function RackPage() {
  const { user } = useAuth();
  return (
    <RackView
      memberClubs={user?.clubs.map((membership) => ({ id: membership.clubId, name: membership.clubName })) ?? []}
      anyClub={user?.role === 'ADMIN'}
      units={user?.unitSystem ?? 'METRIC'}
    />
  );
}
