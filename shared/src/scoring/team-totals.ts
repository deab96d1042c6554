import { ClubTally, countPlace } from './club-tally.js';
import { meetTieBreak, rankClubTotals } from './rank-club-totals.js';
import type { ScoredResult } from './score-event.js';
import type { MeetTotals } from './standings-types.js';

export interface DivisionEvent {
  division: string;
  results: readonly Pick<ScoredResult, 'clubId' | 'points' | 'place' | 'countsForClub' | 'provisional'>[];
}

/**
 * One meet's club totals per division: the sum of each club's event points, ranked by
 * points, then by most event first places, then seconds, and so on (see `meetTieBreak`).
 * Every club with an entry appears, with 0 points if it scored none. Only entries that
 * count for their club add to its place counts.
 */
export function teamTotals(events: readonly DivisionEvent[]): MeetTotals {
  const tally = new ClubTally();
  let provisional = false;
  for (const event of events) {
    for (const result of event.results) {
      const row = tally.row(event.division, result.clubId);
      row.points += result.points;
      if (result.countsForClub && result.place !== null) countPlace(row.placeCounts, result.place);
      provisional ||= result.provisional;
    }
  }
  const divisions = tally.entries().map(([division, rows]) => ({
    division,
    clubs: rankClubTotals(rows).map(({ clubId, points, placeCounts, place, tied }) => ({
      clubId,
      points,
      placeCounts,
      place,
      tied,
    })),
  }));
  return { divisions, tieBreak: meetTieBreak, provisional };
}
