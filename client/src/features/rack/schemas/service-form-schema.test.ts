import { describe, expect, it } from '@jest/globals';

import { serviceFormDefaults, serviceFormSchema, toServiceInput } from './service-form-schema.js';

describe('the service form', () => {
  it('sends a regrind with the new bevel and chisel in SI units and leaves empty boxes unchanged', () => {
    const values = serviceFormSchema.parse({ ...serviceFormDefaults('2026-11-30'), bevelIncluded: '16', chiselWidth: '1', status: 'READY' });
    // 1 in × 25.4 = 25.4 mm (exact, NIST SP 811, App. B.8).
    expect(toServiceInput('axe-1', values, 'IMPERIAL')).toEqual({
      axeId: 'axe-1',
      kind: 'REGRIND',
      doneOn: '2026-11-30',
      doneBy: null,
      notes: '',
      setup: { bevelIncludedDeg: 16, chiselWidthMm: 25.4, status: 'READY' },
    });
  });

  it('ignores boxes the kind of work does not show', () => {
    // A hone does not change the bevel, even if a value was left in that box from a regrind.
    const values = serviceFormSchema.parse({ ...serviceFormDefaults('2026-11-30', 'HONE'), bevelIncluded: '16' });
    expect(toServiceInput('axe-1', values, 'METRIC').setup).toBeNull();
  });

  it('records a rehang with the hang checked', () => {
    const values = serviceFormSchema.parse({ ...serviceFormDefaults('2026-11-30', 'REHANG'), handleLength: '762', handleWood: 'hickory', hangChecked: 'yes' });
    expect(toServiceInput('axe-1', values, 'METRIC').setup).toEqual({ handleLengthMm: 762, handleWood: 'hickory', hangChecked: true });
  });
});
