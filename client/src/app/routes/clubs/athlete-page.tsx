import { useParams } from 'react-router';

import { AthleteProfile } from '../../../features/clubs/components/athlete-profile.js';

export function AthletePage() {
  const { athleteId = '' } = useParams();
  return <AthleteProfile key={athleteId} athleteId={athleteId} />;
}
