import type { MeetScoring } from '../api/types.js';

const ordinal = (n: number) => {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  return `${n}${{ 1: 'st', 2: 'nd', 3: 'rd' }[n % 10] ?? 'th'}`;
};

const points = (n: number) => `${n} ${n === 1 ? 'point' : 'points'}`;

/** How a meet is scored, in plain sentences for athletes and parents: the scheme first, then each option. */
export function describeScoring(meet: MeetScoring): string[] {
  const lines: string[] = [];
  if (meet.scoringScheme === 'FIXED_TABLE' && meet.pointsTable?.length) {
    const table = meet.pointsTable.map((p, i) => `${ordinal(i + 1)} ${p}`).join(', ');
    lines.push(`Places earn points from a fixed table: ${table}. Lower places earn nothing.`);
  } else if (meet.scoringScheme === 'FIELD_SIZE') {
    lines.push('First place earns as many points as there are clubs in the event; each place below earns one point less.');
  } else if (meet.scoringScheme === 'PERCENT_OF_BEST') {
    lines.push(
      'Every event is worth 100: the winner scores 100 and everyone else a share of it (100 × best time ÷ own time; for scored events 100 × own score ÷ best score). This formula is our stated choice.',
    );
  } else {
    lines.push('Places earn points from a fixed table the organiser has not filled in yet.');
  }
  lines.push(
    meet.runOffTopPlaces > 0
      ? `Ties for the top ${meet.runOffTopPlaces === 1 ? 'place' : `${meet.runOffTopPlaces} places`} are settled by a run-off; lower ties share the place and split its points.`
      : 'Tied athletes share the place and split the points of the places they cover.',
  );
  if (meet.bestEntryPerClub) lines.push("Only each club's best entry in an event scores.");
  if (meet.minimumOnePoint) lines.push(`Every club that enters an event earns at least ${points(1)} in it.`);
  lines.push('A disqualification earns nothing.');
  if (meet.maxEventsPerAthlete !== null) {
    const n = meet.maxEventsPerAthlete;
    lines.push(`Each athlete may enter at most ${n} ${n === 1 ? 'event' : 'events'}.`);
  }
  if (meet.requireMixedPairs) lines.push('Mixed pairs are one woman and one man.');
  return lines;
}
