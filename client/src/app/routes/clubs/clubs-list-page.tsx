import { PageHeading } from '../../../components/ui/page-heading.js';
import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { ClubsList } from '../../../features/clubs/components/clubs-list.js';

export function ClubsListPage() {
  const { user } = useAuth();
  return (
    <>
      <PageHeading lead="The league's clubs and their rosters. Coaches keep their own club's roster and invitations here.">Clubs</PageHeading>
      <ClubsList myClubIds={user?.clubs.map((membership) => membership.clubId) ?? []} canAdd={user?.role === 'ADMIN'} />
    </>
  );
}
