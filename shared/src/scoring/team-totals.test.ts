import { describe, expect, it } from '@jest/globals';

import { teamTotals, type DivisionEvent } from './team-totals.js';

type Row = DivisionEvent['results'][number];
const row = (clubId: string, place: number | null, points: number, more: Partial<Row> = {}): Row => ({
  clubId,
  place,
  points,
  countsForClub: true,
  provisional: false,
  ...more,
});

describe('teamTotals', () => {
  it('sums club points per division and ranks them', () => {
    // hand-worked: open — cedar 5 + 7 = 12, ash 7 + 4 = 11, birch 6 + 5 = 11; women — ash 7, birch 6
    const totals = teamTotals([
      { division: 'open', results: [row('ash', 1, 7), row('birch', 2, 6), row('cedar', 3, 5)] },
      { division: 'open', results: [row('cedar', 1, 7), row('birch', 3, 5), row('ash', 4, 4)] },
      { division: 'women', results: [row('ash', 1, 7), row('birch', 2, 6)] },
    ]);
    const open = totals.divisions.find((division) => division.division === 'open');
    expect(open?.clubs.map((club) => [club.clubId, club.points, club.place])).toEqual([
      ['cedar', 12, 1],
      ['ash', 11, 2],
      ['birch', 11, 3],
    ]);
    expect(totals.divisions.map((division) => division.division)).toEqual(['open', 'women']);
  });

  it('separates clubs level on points by most first places', () => {
    // hand-worked: ash and birch both 11; ash has a first place (1st + 4th), birch none
    // (2nd + 3rd), so ash ranks ahead; cedar has one 1st and one 3rd
    const totals = teamTotals([
      { division: 'open', results: [row('ash', 1, 7), row('birch', 2, 6), row('cedar', 3, 5)] },
      { division: 'open', results: [row('cedar', 1, 7), row('birch', 3, 5), row('ash', 4, 4)] },
    ]);
    expect(totals.divisions[0]?.clubs.find((club) => club.clubId === 'ash')).toMatchObject({
      placeCounts: [1, 0, 0, 1],
      tied: false,
    });
    expect(totals.tieBreak).toMatch(/most event first places, then the most second places/);
  });

  it('lets clubs still level after countback share the place', () => {
    // hand-worked: elm and fir each one 2nd place worth 6 → level on points and places, both 2nd;
    // pine, behind both, is 4th (the shared place skips the next)
    const totals = teamTotals([
      { division: 'open', results: [row('oak', 1, 7), row('elm', 2, 6), row('pine', 3, 5)] },
      { division: 'open', results: [row('oak', 1, 7), row('fir', 2, 6)] },
    ]);
    expect(totals.divisions[0]?.clubs.map((club) => [club.clubId, club.place, club.tied])).toEqual([
      ['oak', 1, false],
      ['elm', 2, true],
      ['fir', 2, true],
      ['pine', 4, false],
    ]);
  });

  it('keeps float noise from splitting a tie', () => {
    // hand-worked: 0.1 + 0.2 is 0.30000000000000004 in binary; rounded to two decimals it equals 0.3
    const totals = teamTotals([
      { division: 'open', results: [row('ash', null, 0.1), row('birch', null, 0.3)] },
      { division: 'open', results: [row('ash', null, 0.2)] },
    ]);
    expect(totals.divisions[0]?.clubs.map((club) => [club.clubId, club.points, club.place])).toEqual([
      ['ash', 0.3, 1],
      ['birch', 0.3, 1],
    ]);
  });

  it("counts only a club's scoring entries in its place counts and says when points are provisional", () => {
    const totals = teamTotals([
      {
        division: 'open',
        results: [
          row('ash', 1, 7, { provisional: true }),
          row('ash', 2, 0, { countsForClub: false }),
          row('elm', 3, 6),
        ],
      },
    ]);
    expect(totals.divisions[0]?.clubs.find((club) => club.clubId === 'ash')?.placeCounts).toEqual([1]);
    expect(totals.provisional).toBe(true);
  });
});
