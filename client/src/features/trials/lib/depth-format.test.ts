import { describe, expect, it } from '@jest/globals';

import { depthValue, formatDepth, formatDiameter, localiseRecommendation } from './depth-format.js';

describe('depth in the reader units', () => {
  it('prints millimetres or inches with the unit', () => {
    // 35.2 mm ÷ 25.4 = 1.3858 in → "1.39 in" (1 in = 25.4 mm exactly, NIST SP 811).
    expect(formatDepth(35.2, 'IMPERIAL')).toBe('1.39 in');
    expect(formatDepth(35.2, 'METRIC')).toBe('35.2 mm');
    // 304.8 mm = 12 in exactly; a metric reader sees the block to the millimetre.
    expect(formatDiameter(304.8, 'IMPERIAL')).toBe('12 in');
    expect(formatDiameter(304.8, 'METRIC')).toBe('305 mm');
    expect(depthValue(25.4, 'IMPERIAL')).toBe(1);
  });

  it('turns the millimetres in the recommendation into inches for an imperial reader', () => {
    const sentence = 'For green quaking aspen: 1st Kestrel (35.2 mm a swing, 1.17× the reference); 2nd Old Tom (30.0 mm a swing, reference).';
    // 30.0 mm ÷ 25.4 = 1.1811 in → "1.18 in".
    expect(localiseRecommendation(sentence, 'IMPERIAL')).toBe(
      'For green quaking aspen: 1st Kestrel (1.39 in a swing, 1.17× the reference); 2nd Old Tom (1.18 in a swing, reference).',
    );
    expect(localiseRecommendation(sentence, 'METRIC')).toBe(sentence);
  });
});
