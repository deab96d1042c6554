import { useParams } from 'react-router';

import { useAuth } from '../../../features/auth/hooks/use-auth.js';
import { AxeView } from '../../../features/rack/components/axe-view.js';
import { AxeResultsList } from '../../../features/results/components/axe-results-list.js';

export function AxePage() {
  const { axeId = '' } = useParams();
  const { user } = useAuth();
  // The local calendar day, as the coach means "today" for a service entry.
  const now = new Date();
  const today = `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
  const units = user?.unitSystem ?? 'METRIC';
  return <AxeView key={axeId} axeId={axeId} units={units} today={today} results={<AxeResultsList axeId={axeId} units={units} />} />;
}
