import { describe, expect, it } from '@jest/globals';

import { contrastRatio } from '../../../lib/contrast-ratio.js';
import { effectColour, effectHex, effectTextColour, effectWords } from './effect-colour.js';

describe('effectColour', () => {
  it('is pale at no difference and full blue at 8 % faster', () => {
    // hand-worked: strength 0 gives the neutral colour, strength 1 the end colour
    expect(effectColour(1)).toBe('rgb(244, 241, 234)');
    expect(effectColour(0.92)).toBe('rgb(22, 70, 132)');
    expect(effectColour(1.2)).toBe('rgb(150, 62, 8)');
  });

  it('keeps cell text readable at WCAG AA (4.5:1) across the scale', () => {
    // WCAG 2.1 success criterion 1.4.3: 4.5:1 for normal text
    for (let ratio = 0.9; ratio <= 1.1; ratio += 0.005) {
      expect([ratio.toFixed(3), contrastRatio(effectHex(ratio), effectTextColour(ratio)) >= 4.5]).toEqual([ratio.toFixed(3), true]);
    }
  });

  it('words the ratio in whole per cent', () => {
    // hand-worked: 0.96 → 4 % faster; 1.02 → 2 % slower; 0.996 rounds to 0 %
    expect(effectWords(0.96)).toBe('4 % faster');
    expect(effectWords(1.02)).toBe('2 % slower');
    expect(effectWords(0.996)).toBe('within 1 %');
  });
});
