import { describe, expect, it } from '@jest/globals';

import { axeValues, SETUP_FIELDS } from './axe-values.js';
import type { AxeInput } from './dto/axe.input.js';
import { DEMO_RACKS } from './seed-rack-data.js';

const seeds = Object.values(DEMO_RACKS).flat();

describe('the demo racks', () => {
  it('hold only axes the add-axe form would accept', () => {
    for (const { services: _services, ...axe } of seeds) expect(() => axeValues(axe as unknown as AxeInput)).not.toThrow();
  });

  it('record changes only on setup fields, in date order', () => {
    for (const axe of seeds) {
      const dates = axe.services.map((s) => s.doneOn);
      expect(dates).toEqual([...dates].sort());
      for (const s of axe.services) for (const field of Object.keys(s.before ?? {})) expect(SETUP_FIELDS).toContain(field);
    }
  });

  it('use invented makers only', () => {
    // The product owner's rule: demo makers are invented; these are the ones the seed uses.
    expect(new Set(seeds.map((a) => a.maker))).toEqual(new Set(['Hollowbrook Forge', 'Tallowmere Grinding Co.', 'Ferncombe Smithy', 'Ridgeback Edgeworks']));
  });
});
