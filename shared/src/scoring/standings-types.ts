export interface ClubStanding {
  clubId: string;
  /** Rounded half up to two decimals. */
  points: number;
  /** Event places won by the club's scoring entries: [firsts, seconds, thirds, …]. */
  placeCounts: number[];
  place: number;
  tied: boolean;
}

export interface DivisionStanding<T extends ClubStanding = ClubStanding> {
  division: string;
  clubs: T[];
}

export interface MeetTotals {
  divisions: DivisionStanding[];
  /** The tie-break rule in words, for the page to print under the table. */
  tieBreak: string;
  /** Some points are shared only until a run-off is run. */
  provisional: boolean;
}

export interface SeasonClubStanding extends ClubStanding {
  /** Meets in which the club scored in this division. */
  meets: number;
}

export interface SeasonStandings {
  divisions: DivisionStanding<SeasonClubStanding>[];
  tieBreak: string;
  provisional: boolean;
}
