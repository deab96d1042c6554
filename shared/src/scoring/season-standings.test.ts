import { describe, expect, it } from '@jest/globals';

import { seasonStandings } from './season-standings.js';
import type { ClubStanding, MeetTotals } from './standings-types.js';

const club = (clubId: string, points: number, placeCounts: number[]): ClubStanding => ({
  clubId,
  points,
  placeCounts,
  place: 0, // the meet place is not read by the season roll-up
  tied: false,
});
type MeetInput = Pick<MeetTotals, 'divisions' | 'provisional'>;
const meet = (division: string, clubs: ClubStanding[], provisional = false): MeetInput => ({
  divisions: [{ division, clubs }],
  provisional,
});

describe('seasonStandings', () => {
  it('sums meet points and counts the meets each club scored in', () => {
    // hand-worked: ash 30 + 12.5 = 42.5 over two meets; birch 28 + 20 = 48; cedar 15 at one meet
    const season = seasonStandings([
      meet('open', [club('ash', 30, [2]), club('birch', 28, [1, 1])]),
      meet('open', [club('ash', 12.5, [0, 1]), club('birch', 20, [1]), club('cedar', 15, [0, 0, 2])]),
    ]);
    expect(season.divisions[0]?.clubs.map((one) => [one.clubId, one.points, one.meets, one.place])).toEqual([
      ['birch', 48, 2, 1],
      ['ash', 42.5, 2, 2],
      ['cedar', 15, 1, 3],
    ]);
  });

  it('breaks a season tie by most first places, then seconds, over all meets', () => {
    // hand-worked: both 40 points; firsts ash 1 + 1 = 2, birch 2 + 0 = 2; seconds ash 0 + 2 = 2,
    // birch 1 + 0 = 1 → ash ahead on seconds
    const season = seasonStandings([
      meet('open', [club('ash', 20, [1]), club('birch', 25, [2, 1])]),
      meet('open', [club('ash', 20, [1, 2]), club('birch', 15, [])]),
    ]);
    expect(season.divisions[0]?.clubs.map((one) => [one.clubId, one.placeCounts, one.place])).toEqual([
      ['ash', [2, 2], 1],
      ['birch', [2, 1], 2],
    ]);
    expect(season.tieBreak).toBe(
      "Clubs level on season points are separated by the most event first places across the season's meets, " +
        'then the most second places, and so on down the places; clubs still level share the place.',
    );
  });

  it('keeps divisions apart and reports provisional meets', () => {
    const season = seasonStandings([meet('women', [club('ash', 10, [1])], true), meet('open', [club('ash', 5, [])])]);
    expect(season.divisions.map((division) => [division.division, division.clubs[0]?.points])).toEqual([
      ['open', 5],
      ['women', 10],
    ]);
    expect(season.provisional).toBe(true);
  });
});
