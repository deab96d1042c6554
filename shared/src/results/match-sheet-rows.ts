import { DIVISION_LABELS, type Division } from '../league/divisions.js';
import type { EventResultKind } from '../league/event-catalogue.js';
import { choiceKey } from './read-choice.js';
import { sheetError, type SheetError } from './sheet-error.js';
import type { SheetRow } from './sheet-row.js';

export interface SheetMeetEvent {
  id: string;
  code: string;
  name: string;
  division: Division;
  kind: EventResultKind;
  speciesId: string | null;
  diameterMm: number | null;
}

export interface SheetClub {
  id: string;
  name: string;
  shortName: string;
}

export interface SheetEntry {
  id: string;
  meetEventId: string;
  clubId: string;
  /** Full names ("First Last") of the entry's athletes. */
  athleteNames: readonly string[];
}

export interface MeetSheetContext {
  events: readonly SheetMeetEvent[];
  clubs: readonly SheetClub[];
  entries: readonly SheetEntry[];
}

/** A sheet row tied to its meet event and entry, with the block filled from the meet event. */
export interface MatchedSheetRow extends SheetRow {
  meetEventId: string;
  entryId: string;
  clubId: string;
  kind: EventResultKind;
}

export type MatchSheetRows = { ok: true; rows: MatchedSheetRow[] } | { ok: false; errors: SheetError[] };

const nameKey = (name: string): string => name.trim().toLowerCase().replace(/\s+/g, ' ');
const athletesKey = (names: readonly string[]): string => names.map(nameKey).sort().join(' & ');

/**
 * Finds each row's meet event (by name or code, and division), club (by name or short name)
 * and entry (the same athletes, in any order), and checks the row against the event's kind.
 * An entry named twice is refused: the sheet would not say which line is right.
 */
export function matchSheetRows(rows: readonly SheetRow[], context: MeetSheetContext): MatchSheetRows {
  const clubs = new Map(context.clubs.flatMap((c) => [[choiceKey(c.name), c], [choiceKey(c.shortName), c]] as const));
  const entries = new Map(context.entries.map((e) => [`${e.meetEventId}|${e.clubId}|${athletesKey(e.athleteNames)}`, e]));
  const seen = new Map<string, number>();
  const matched: MatchedSheetRow[] = [];
  const errors: SheetError[] = [];
  for (const row of rows) {
    const fail = (column: string, problem: string): void => {
      errors.push(sheetError(row.row, column, problem));
    };
    const named = context.events.filter((e) => choiceKey(e.name) === choiceKey(row.event) || choiceKey(e.code) === choiceKey(row.event));
    const event = named.find((e) => e.division === row.division);
    const club = clubs.get(choiceKey(row.club));
    if (named.length === 0) fail('event', `"${row.event}" is not an event of this meet`);
    else if (!event) fail('division', `this meet has no ${named[0]!.name} in the ${DIVISION_LABELS[row.division]} division`);
    if (!club) fail('club', `"${row.club}" is not a club in the league`);
    if (!event || !club) continue;
    const entry = entries.get(`${event.id}|${club.id}|${athletesKey(row.athletes)}`);
    if (!entry) {
      fail('athletes', `${club.name} has no entry of "${row.athletes.join(' & ')}" in ${event.name} (${DIVISION_LABELS[event.division]})`);
      continue;
    }
    const earlier = seen.get(entry.id);
    if (earlier !== undefined) {
      fail('athletes', `the same entry as row ${earlier}; give each entry one row`);
      continue;
    }
    seen.set(entry.id, row.row);
    const problems = kindProblems(row, event);
    for (const [column, problem] of problems) fail(column, problem);
    if (problems.length) continue;
    matched.push({
      ...row,
      speciesId: row.speciesId ?? event.speciesId,
      diameterMm: row.diameterMm ?? event.diameterMm,
      meetEventId: event.id,
      entryId: entry.id,
      clubId: club.id,
      kind: event.kind,
    });
  }
  return errors.length ? { ok: false, errors } : { ok: true, rows: matched };
}

function kindProblems(row: SheetRow, event: SheetMeetEvent): [string, string][] {
  const problems: [string, string][] = [];
  const finished = row.status === 'FINISHED';
  if (row.status === 'SCRATCH' && row.rawTimes.length > 0) problems.push(['time', 'a scratch has no time; leave it empty or mark the result finished']);
  if (event.kind === 'TIMED') {
    if (row.score !== null) problems.push(['score', `${event.name} is timed; leave the score empty`]);
    if (finished && row.rawTimes.length === 0) problems.push(['time', `a finished ${event.name} result needs a time`]);
  } else {
    const what = event.kind === 'SCORED' ? 'a score' : 'a hit count';
    if (finished && row.score === null) problems.push(['score', `a finished ${event.name} result needs ${what}`]);
    if (event.kind === 'FEWEST_HITS' && row.score !== null && !Number.isInteger(row.score)) {
      problems.push(['score', `${row.score} hits is not a whole number`]);
    }
  }
  return problems;
}
