import type { EventResultKind } from '../league/event-catalogue.js';

export interface BestCandidate {
  id: string;
  eventTypeId: string;
  kind: EventResultKind;
  diameterMm: number | null;
  /** Only placed (finished) results can be a best. */
  place: number | null;
  totalHundredths: number | null;
  score: number | null;
  meetDate: string;
}

/**
 * An athlete's best result per event and block diameter: the lowest time plus penalties in
 * timed events, the highest score in scored events and the fewest hits in fewest-hits events
 * (time then breaks the tie in both), the earlier result keeping a best it shares. Bests are
 * listed by event, then diameter, in first-seen order of the input.
 */
export function personalBests<T extends BestCandidate>(results: readonly T[]): T[] {
  const best = new Map<string, T>();
  for (const result of results) {
    if (result.place === null) continue;
    const key = `${result.eventTypeId}|${result.diameterMm ?? ''}`;
    const held = best.get(key);
    if (!held || better(result, held)) best.set(key, result);
  }
  return [...best.values()];
}

function better(a: BestCandidate, b: BestCandidate): boolean {
  const time = (r: BestCandidate): number => r.totalHundredths ?? Number.POSITIVE_INFINITY;
  const score = (r: BestCandidate): number => r.score ?? 0;
  let difference = 0;
  if (a.kind === 'SCORED') difference = score(b) - score(a);
  else if (a.kind === 'FEWEST_HITS') difference = score(a) - score(b);
  if (difference === 0) difference = time(a) - time(b);
  if (difference === 0) difference = a.meetDate < b.meetDate ? -1 : 0;
  return difference < 0;
}
