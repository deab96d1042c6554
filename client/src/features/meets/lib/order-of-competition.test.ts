import { describe, expect, it } from '@jest/globals';

import type { Entry } from '../api/types.js';
import { orderOfCompetition } from './order-of-competition.js';

function entry(id: string, drawPosition: number | null, heat: number | null): Entry {
  return { id, meetEventId: 'e1', clubId: 'c1', clubName: 'Hollow Pine', clubShortName: 'HPINE', label: id, athletes: [], drawPosition, heat };
}

describe('orderOfCompetition', () => {
  it('groups a drawn event by heat, each heat in draw order', () => {
    // hand-worked: five entries drawn into heats of two → heats 1 (1,2), 2 (3,4), 3 (5)
    const order = orderOfCompetition([entry('c', 3, 2), entry('a', 1, 1), entry('e', 5, 3), entry('b', 2, 1), entry('d', 4, 2)]);
    expect(order?.heats.map((h) => [h.heat, h.entries.map((e) => e.id)])).toEqual([
      [1, ['a', 'b']],
      [2, ['c', 'd']],
      [3, ['e']],
    ]);
    expect(order?.undrawn).toEqual([]);
  });

  it('keeps entries made after the draw apart, with no place', () => {
    const order = orderOfCompetition([entry('a', 1, 1), entry('late', null, null)]);
    expect(order?.heats).toHaveLength(1);
    expect(order?.undrawn.map((e) => e.id)).toEqual(['late']);
  });

  it('has no order before the first draw', () => {
    expect(orderOfCompetition([entry('a', null, null)])).toBeNull();
    expect(orderOfCompetition([])).toBeNull();
  });
});
