import { describe, expect, it } from '@jest/globals';

import { checkEntry, type EntryContext } from './check-entry.js';
import { drawOrder } from './draw-order.js';
import { meetStatusProblem } from './meet-status.js';

const ctx = (over: Partial<EntryContext> = {}): EntryContext => ({
  clubId: 'c1',
  division: 'MIXED',
  eventName: 'Mixed double buck',
  teamSize: 2,
  requireMixedPair: true,
  maxEventsPerAthlete: null,
  alreadyInEvent: new Set(),
  eventsPerAthlete: new Map(),
  ...over,
});
const woman = { id: 'w', name: 'Tove Greywater', clubId: 'c1', divisions: ['WOMENS', 'MIXED'] as const };
const man = { id: 'm', name: 'Bram Elderby', clubId: 'c1', divisions: ['MENS', 'MIXED'] as const };
const man2 = { id: 'm2', name: 'Ivo Quenby', clubId: 'c1', divisions: ['MENS', 'MIXED'] as const };

describe('checkEntry', () => {
  it('accepts a woman and a man from the club in a mixed pair', () => {
    expect(checkEntry([woman, man], ctx())).toEqual([]);
  });

  it('asks a mixed pair for one woman and one man', () => {
    expect(checkEntry([man, man2], ctx()).map((p) => p.message)).toEqual(['Mixed double buck needs one woman and one man in the pair.']);
  });

  it('needs two athletes for a pair event', () => {
    expect(checkEntry([man], ctx())[0]?.message).toBe('Mixed double buck needs 2 athletes; 1 picked.');
  });

  it('refuses an athlete from another club', () => {
    const other = { ...man, clubId: 'c2' };
    expect(checkEntry([woman, other], ctx())[0]?.message).toBe("Bram Elderby is not on this club's roster.");
  });

  it('refuses an athlete outside the division', () => {
    const problems = checkEntry([man], ctx({ division: 'WOMENS', teamSize: 1, eventName: 'Underhand chop', requireMixedPair: false }));
    expect(problems[0]?.message).toBe("Bram Elderby does not compete in the Women's division.");
  });

  it('refuses the same athlete twice in one event', () => {
    const problems = checkEntry([woman, man], ctx({ alreadyInEvent: new Set(['w']) }));
    expect(problems[0]?.message).toBe('Tove Greywater is already entered in Mixed double buck.');
  });

  it("holds the meet's per-athlete event limit", () => {
    const problems = checkEntry([woman, man], ctx({ maxEventsPerAthlete: 3, eventsPerAthlete: new Map([['m', 3]]) }));
    expect(problems[0]?.message).toBe("Bram Elderby has reached this meet's limit of 3 events.");
  });
});

describe('drawOrder', () => {
  const entries = ['e1', 'e2', 'e3', 'e4', 'e5'].map((id) => ({ id }));

  it('gives the same draw for the same seed whatever the input order', () => {
    const a = drawOrder(entries, 20261201, 2).map((s) => s.item.id);
    const b = drawOrder([...entries].reverse(), 20261201, 2).map((s) => s.item.id);
    expect(a).toEqual(b);
  });

  it('fills heats in order of competition', () => {
    expect(drawOrder(entries, 7, 2).map((s) => s.heat)).toEqual([1, 1, 2, 2, 3]);
  });

  it('usually gives another order for another seed', () => {
    const orders = new Set([1, 2, 3, 4, 5, 6].map((seed) => drawOrder(entries, seed, 5).map((s) => s.item.id).join()));
    expect(orders.size).toBeGreaterThan(1);
  });
});

describe('meetStatusProblem', () => {
  it('lets a draft open for entries', () => {
    expect(meetStatusProblem('DRAFT', 'OPEN')).toBeNull();
  });

  it('explains why a draft cannot publish results', () => {
    expect(meetStatusProblem('DRAFT', 'PUBLISHED')).toBe('A meet that is "Being built" can only move to "Taking entries" or "Archived".');
  });
});
