import { describe, expect, it } from '@jest/globals';

import { evidenceHref, grainMapHref } from './evidence-link.js';

describe('evidence links', () => {
  it('points a Grain Map cell at its row with the grind and condition in the query', () => {
    expect(evidenceHref({ kind: 'GRAIN_CELL', refId: null, species: 'quaking-aspen', grind: 'CHISEL', condition: 'GREEN', label: 'cell', summary: '' })).toBe(
      '/grain-map?species=quaking-aspen&condition=GREEN&cell=quaking-aspen~CHISEL',
    );
  });

  it('leaves out what a row does not name', () => {
    expect(grainMapHref({ species: 'eastern-white-pine' })).toBe('/grain-map?species=eastern-white-pine');
  });

  it('links a trial by its id', () => {
    expect(evidenceHref({ kind: 'TRIAL', refId: 'a b', species: null, grind: null, condition: null, label: 't', summary: '' })).toBe('/trials/a%20b');
  });
});
