import { compareCodeUnits } from './compare-code-units.js';

export interface ClubTallyRow {
  clubId: string;
  points: number;
  placeCounts: number[];
  meets: number;
}

/** Running sums of points and place counts per division and club, for meet and season totals. */
export class ClubTally {
  private readonly divisions = new Map<string, Map<string, ClubTallyRow>>();

  row(division: string, clubId: string): ClubTallyRow {
    const clubs = this.divisions.get(division) ?? new Map<string, ClubTallyRow>();
    this.divisions.set(division, clubs);
    const row = clubs.get(clubId) ?? { clubId, points: 0, placeCounts: [], meets: 0 };
    clubs.set(clubId, row);
    return row;
  }

  /** Divisions in code-unit order of their names, so output never depends on input order. */
  entries(): [string, ClubTallyRow[]][] {
    return [...this.divisions.entries()]
      .sort(([a], [b]) => compareCodeUnits(a, b))
      .map(([division, clubs]) => [division, [...clubs.values()]]);
  }
}

export function countPlace(placeCounts: number[], place: number): void {
  while (placeCounts.length < place) placeCounts.push(0);
  placeCounts[place - 1] = (placeCounts[place - 1] ?? 0) + 1;
}

export function addPlaceCounts(placeCounts: number[], more: readonly number[]): void {
  more.forEach((count, index) => {
    placeCounts[index] = (placeCounts[index] ?? 0) + count;
  });
}
