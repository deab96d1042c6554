import { describe, expect, it } from '@jest/globals';

import { contrastRatio } from './contrast-ratio.js';

describe('contrastRatio', () => {
  it('gives 21:1 for black on white', () => {
    // WCAG 2.1, definition of contrast ratio: (1 + 0.05) / (0 + 0.05) = 21
    expect(contrastRatio('#000000', '#FFFFFF')).toBeCloseTo(21, 10);
  });

  it('gives 1:1 for a colour on itself', () => {
    // WCAG 2.1 contrast ratio formula: (L + 0.05) / (L + 0.05) = 1
    expect(contrastRatio('#7A4A2A', '#7A4A2A')).toBe(1);
  });

  it('puts mid grey #777777 on white just under the 4.5:1 AA line', () => {
    // hand-worked: 0x77/255 = 0.46667; ((0.46667 + 0.055) / 1.055)^2.4 = 0.18447;
    // (1.05) / (0.18447 + 0.05) = 4.478
    expect(contrastRatio('#777777', '#FFFFFF')).toBeCloseTo(4.478, 3);
  });

  it('does not depend on which colour is the text', () => {
    // WCAG 2.1: the lighter luminance always goes on top of the fraction
    expect(contrastRatio('#FFFFFF', '#1F4D3A')).toBe(contrastRatio('#1F4D3A', '#FFFFFF'));
  });

  it('rejects colours it cannot read', () => {
    expect(() => contrastRatio('spruce', '#FFFFFF')).toThrow('#RRGGBB');
  });
});
