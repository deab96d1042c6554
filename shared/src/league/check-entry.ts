import { DIVISION_LABELS, type Division } from './divisions.js';

export interface EntryAthlete {
  id: string;
  name: string;
  clubId: string;
  divisions: readonly Division[];
}

export interface EntryContext {
  clubId: string;
  division: Division;
  eventName: string;
  teamSize: number;
  /** The meet asks a mixed pair to be one woman and one man. */
  requireMixedPair: boolean;
  /** Per-athlete limit of events at this meet, or null for none. */
  maxEventsPerAthlete: number | null;
  /** Athlete ids already entered in this meet event. */
  alreadyInEvent: ReadonlySet<string>;
  /** How many events of this meet each athlete is already entered in. */
  eventsPerAthlete: ReadonlyMap<string, number>;
}

export interface EntryProblem {
  field: 'athleteIds';
  message: string;
}

/** Every rule an entry breaks, each with a message fit to show the coach. Empty when fine. */
export function checkEntry(athletes: readonly EntryAthlete[], ctx: EntryContext): EntryProblem[] {
  const problems: string[] = [];
  const ids = athletes.map((a) => a.id);
  if (new Set(ids).size !== ids.length) problems.push('The same athlete is listed twice in this entry.');
  if (athletes.length !== ctx.teamSize) {
    problems.push(
      ctx.teamSize === 1
        ? `${ctx.eventName} is for one athlete; pick exactly one.`
        : `${ctx.eventName} needs ${ctx.teamSize} athletes; ${athletes.length} picked.`,
    );
  }
  for (const a of athletes) {
    if (a.clubId !== ctx.clubId) problems.push(`${a.name} is not on this club's roster.`);
    if (!a.divisions.includes(ctx.division)) {
      problems.push(`${a.name} does not compete in the ${DIVISION_LABELS[ctx.division]} division.`);
    }
    if (ctx.alreadyInEvent.has(a.id)) problems.push(`${a.name} is already entered in ${ctx.eventName}.`);
    const count = ctx.eventsPerAthlete.get(a.id) ?? 0;
    if (ctx.maxEventsPerAthlete !== null && count >= ctx.maxEventsPerAthlete) {
      const limit = ctx.maxEventsPerAthlete;
      problems.push(`${a.name} has reached this meet's limit of ${limit} event${limit === 1 ? '' : 's'}.`);
    }
  }
  if (ctx.requireMixedPair && athletes.length === 2) {
    const women = athletes.filter((a) => a.divisions.includes('WOMENS')).length;
    const men = athletes.filter((a) => a.divisions.includes('MENS')).length;
    if (women < 1 || men < 1) problems.push(`${ctx.eventName} needs one woman and one man in the pair.`);
  }
  return problems.map((message) => ({ field: 'athleteIds', message }));
}
