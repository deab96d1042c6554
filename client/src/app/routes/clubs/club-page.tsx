import { useParams } from 'react-router';

import { ClubView } from '../../../features/clubs/components/club-view.js';

export function ClubPage() {
  const { clubId = '' } = useParams();
  return <ClubView key={clubId} clubId={clubId} />;
}
