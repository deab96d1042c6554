import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { RecordsView } from '../../../features/results/components/records-view.js';

export function RecordsPage() {
  const { user } = useAuth();
  return <RecordsView units={user?.unitSystem ?? 'METRIC'} />;
}
