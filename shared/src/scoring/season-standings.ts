import { addPlaceCounts, ClubTally } from './club-tally.js';
import { rankClubTotals, seasonTieBreak } from './rank-club-totals.js';
import type { MeetTotals, SeasonStandings } from './standings-types.js';

/**
 * Season standings per division: each club's meet points summed across the season, ranked
 * by points, then by most event first places over all meets, then seconds, and so on; clubs
 * still level share the place. The rule comes back in words as `tieBreak`.
 */
export function seasonStandings(meets: readonly Pick<MeetTotals, 'divisions' | 'provisional'>[]): SeasonStandings {
  const tally = new ClubTally();
  for (const meet of meets) {
    for (const { division, clubs } of meet.divisions) {
      for (const club of clubs) {
        const row = tally.row(division, club.clubId);
        row.points += club.points;
        row.meets += 1;
        addPlaceCounts(row.placeCounts, club.placeCounts);
      }
    }
  }
  const divisions = tally.entries().map(([division, rows]) => ({ division, clubs: rankClubTotals(rows) }));
  return { divisions, tieBreak: seasonTieBreak, provisional: meets.some((meet) => meet.provisional) };
}
