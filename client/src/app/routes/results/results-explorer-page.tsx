import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { ResultsExplorer } from '../../../features/results/components/results-explorer.js';

export function ResultsExplorerPage() {
  const { user } = useAuth();
  return <ResultsExplorer units={user?.unitSystem ?? 'METRIC'} />;
}
