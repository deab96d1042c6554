import type {} from '@mui/material/themeCssVarsAugmentation';
import { describe, expect, it } from '@jest/globals';

import { contrastRatio } from '../../lib/contrast-ratio.js';
import { endgrainColors } from './endgrain-colors.js';
import { endgrainTheme } from './endgrain-theme.js';

// WCAG 2.1 SC 1.4.3 (AA): at least 4.5:1 for normal-size text.
const AA_TEXT = 4.5;

describe.each(['light', 'dark'] as const)('the %s colour scheme', (scheme) => {
  const c = endgrainColors[scheme];
  const pairs: Array<[string, string, string]> = [
    ['body text on the page surface', c.text.primary, c.background.default],
    ['body text on cards', c.text.primary, c.background.paper],
    ['secondary text on the page surface', c.text.secondary, c.background.default],
    ['secondary text on cards', c.text.secondary, c.background.paper],
    ['text on primary buttons and the header', c.primary.contrastText, c.primary.main],
    ['text on secondary buttons', c.secondary.contrastText, c.secondary.main],
    ['links and the selected place on cards', c.primary.main, c.background.paper],
    ['links on the page surface', c.primary.main, c.background.default],
    ['text on a filled warning', c.warning.contrastText, c.warning.main],
    ['field error text on cards', c.error.main, c.background.paper],
    ['text on a filled error', c.error.contrastText, c.error.main],
    ['text on a filled info', c.info.contrastText, c.info.main],
    ['text on a filled success', c.success.contrastText, c.success.main],
  ];

  it.each(pairs)('meets WCAG AA for %s', (_name, foreground, background) => {
    expect(contrastRatio(foreground, background)).toBeGreaterThanOrEqual(AA_TEXT);
  });
});

describe('endgrainTheme', () => {
  it('uses Nunito Sans first in every font stack', () => {
    expect(endgrainTheme.typography.fontFamily?.startsWith('"Nunito Sans"')).toBe(true);
  });

  it('offers both a light and a dark colour scheme', () => {
    expect(Object.keys(endgrainTheme.colorSchemes).sort()).toEqual(['dark', 'light']);
  });
});
