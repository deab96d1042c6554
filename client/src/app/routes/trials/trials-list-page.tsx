import { PageHeading } from '../../../components/ui/page-heading.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { TrialsPlace } from '../../../features/trials/components/trials-place.js';

export function TrialsListPage() {
  const { user } = useAuth();
  return (
    <>
      <PageHeading lead="Axe tests on one block: every axe compared with the club's reference axe, ranked for that wood.">Trials</PageHeading>
      <TrialsPlace clubs={user?.clubs ?? []} isAdmin={user?.role === 'ADMIN'} units={user?.unitSystem ?? 'METRIC'} />
    </>
  );
}
