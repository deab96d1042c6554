import { SeasonStandingsView } from '../../../features/standings/components/season-standings-view.js';

export function SeasonStandingsPage() {
  return <SeasonStandingsView />;
}
