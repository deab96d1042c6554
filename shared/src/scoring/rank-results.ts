import { compareCodeUnits } from './compare-code-units.js';
import { groupTies } from './group-ties.js';
import { placeGroups } from './place-groups.js';
import { prepareResult, type PreparedResult } from './prepare-result.js';
import {
  resultKinds,
  type RankedEvent,
  type RankedResult,
  type RankOptions,
  type ResultInput,
  type ResultKind,
  type ResultStatus,
} from './result-types.js';
import { ScoringInputError } from './scoring-input-error.js';

interface Row {
  result: PreparedResult;
  id: string;
}
interface PlacedRow extends Row {
  place: number;
  tied: boolean;
  needsRunOff: boolean;
}

const unplacedOrder: Record<ResultStatus, number> = { finished: 0, 'did-not-finish': 1, disqualified: 2, scratch: 3 };

/**
 * Ranks one event's results.
 * - Only finished results are placed. Timed events rank by time plus penalties, lower first.
 *   Scored events rank by score, higher first; fewest-hits events by hits, fewer first; in
 *   both, time plus penalties breaks a tie only when every tied result has a time (otherwise
 *   they share the place: a tie-break that only some could win would not be fair).
 * - Tied results share the place and the next place is skipped (1, 1, 3).
 * - With `runOffTopPlaces: N`, a tie whose shared place is N or better is flagged
 *   `needsRunOff` and shares its place provisionally until every tied result carries a
 *   `runOffRank`; the run-off order then splits it (equal ranks tie again).
 * - Not-finished results get no place and follow in the order did-not-finish, disqualified,
 *   scratch. Output order never depends on input order: ties are listed by id.
 */
export function rankResults(results: readonly ResultInput[], options: RankOptions): RankedEvent {
  checkOptions(options);
  checkUniqueIds(results);
  const rows = results.map((input) => ({ result: prepareResult(input, options), id: input.id }));
  const finished = rows.filter((row) => row.result.status === 'finished');
  const unplaced = rows
    .filter((row) => row.result.status !== 'finished')
    .sort(
      (a, b) => unplacedOrder[a.result.status] - unplacedOrder[b.result.status] || compareCodeUnits(a.id, b.id),
    );

  const placed = placeWithRunOffs(tieGroups(finished, options.kind), options.runOffTopPlaces ?? 0);
  const ranked = [
    ...placed.map((row) => toRanked(row, row.place, row.tied, row.needsRunOff)),
    ...unplaced.map((row) => toRanked(row, null, false, false)),
  ];
  return { kind: options.kind, results: ranked, runOffsPending: placed.some((row) => row.needsRunOff) };
}

/** Lower is better, whatever the kind. */
function rankKey(kind: ResultKind, result: PreparedResult): number {
  if (kind === 'timed') return result.totalHundredths ?? Number.POSITIVE_INFINITY;
  const score = result.score ?? 0;
  return kind === 'scored' ? -score : score;
}

function tieGroups(finished: readonly Row[], kind: ResultKind): Row[][] {
  const key = (row: Row): number => rankKey(kind, row.result);
  const sorted = [...finished].sort((a, b) => key(a) - key(b) || compareCodeUnits(a.id, b.id));
  const groups = groupTies(sorted, (a, b) => key(a) === key(b));
  if (kind === 'timed') return groups;
  return groups.flatMap((group) => {
    const times = group.map((row) => row.result.totalHundredths);
    if (group.length < 2 || times.includes(null)) return [group];
    const time = (row: Row): number => row.result.totalHundredths ?? 0;
    const byTime = [...group].sort((a, b) => time(a) - time(b) || compareCodeUnits(a.id, b.id));
    return groupTies(byTime, (a, b) => time(a) === time(b));
  });
}

function placeWithRunOffs(groups: readonly Row[][], topPlaces: number): PlacedRow[] {
  const placed: PlacedRow[] = [];
  for (const group of groups) {
    const place = placed.length + 1;
    if (group.length > 1 && place <= topPlaces) placed.push(...runOff(group, place, topPlaces));
    else placed.push(...group.map((row) => ({ ...row, place, tied: group.length > 1, needsRunOff: false })));
  }
  return placed;
}

function runOff(group: readonly Row[], place: number, topPlaces: number): PlacedRow[] {
  const rank = (row: Row): number | null => row.result.input.runOffRank ?? null;
  if (!group.every((row) => Number.isFinite(rank(row)))) {
    return group.map((row) => ({ ...row, place, tied: true, needsRunOff: true }));
  }
  const order = (row: Row): number => rank(row) ?? 0;
  const sorted = [...group].sort((a, b) => order(a) - order(b) || compareCodeUnits(a.id, b.id));
  return placeGroups(groupTies(sorted, (a, b) => order(a) === order(b)), place).map((entry) => ({
    ...entry.item,
    place: entry.place,
    tied: entry.tied,
    needsRunOff: entry.tied && entry.place <= topPlaces,
  }));
}

function toRanked(row: Row, place: number | null, tied: boolean, needsRunOff: boolean): RankedResult {
  const { input, status, reason, timeHundredths, penaltyHundredths, totalHundredths, score } = row.result;
  return {
    id: input.id,
    clubId: input.clubId,
    status,
    reason,
    place,
    tied,
    needsRunOff,
    timeHundredths,
    penaltyHundredths,
    totalHundredths,
    score,
  };
}

function checkOptions(options: RankOptions): void {
  const fail = (message: string): never => {
    throw new ScoringInputError('invalid-option', message);
  };
  if (!resultKinds.includes(options.kind)) fail(`unknown result kind "${String(options.kind)}"`);
  const limit = options.timeLimitHundredths ?? null;
  if (limit !== null && (!Number.isSafeInteger(limit) || limit <= 0)) fail('a time limit is positive hundredths');
  const top = options.runOffTopPlaces ?? null;
  if (top !== null && (!Number.isSafeInteger(top) || top < 0)) fail('run-off places are a whole number');
}

function checkUniqueIds(results: readonly ResultInput[]): void {
  const seen = new Set<string>();
  for (const { id } of results) {
    if (seen.has(id)) throw new ScoringInputError('duplicate-result', `result ${id} appears twice`, id);
    seen.add(id);
  }
}
