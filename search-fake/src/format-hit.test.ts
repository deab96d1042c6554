import { describe, expect, it } from '@jest/globals';

import { formatHit, wordMatcher, type FormatOptions } from './format-hit.js';

function options(overrides: Partial<FormatOptions>): FormatOptions {
  return {
    highlight: ['*'], crop: null, cropLength: 10, cropMarker: '…', preTag: '<em>', postTag: '</em>',
    matcher: wordMatcher(['bevel'], ['bevel'], null), ...overrides,
  };
}

// Expected strings are hand-worked from the inputs.
describe('formatHit', () => {
  it('wraps every matching word and leaves the rest as written', () => {
    const out = formatHit({ title: 'Bevel, then bevel again' }, options({}));
    expect(out['title']).toBe('<em>Bevel</em>, then <em>bevel</em> again');
  });

  it('wraps a whole word matched with a typo but only the typed letters of a prefix', () => {
    const matcher = wordMatcher(['chisle', 'bev'], ['chisel', 'bevels'], 'bev');
    expect(formatHit({ t: 'chisel bevels' }, options({ matcher }))['t']).toBe('<em>chisel</em> <em>bev</em>els');
  });

  it('turns numbers into strings, in arrays and nested objects too', () => {
    expect(formatHit({ angle: 25, list: [1, 'bevel'], head: { width: 38 } }, options({}))).toEqual({
      angle: '25', list: ['1', '<em>bevel</em>'], head: { width: '38' },
    });
  });

  it('highlights only the attributes asked for', () => {
    const out = formatHit({ title: 'bevel', body: 'bevel' }, options({ highlight: ['title'] }));
    expect(out).toEqual({ title: '<em>bevel</em>', body: 'bevel' });
  });

  it('crops around the first match with markers on the cut sides', () => {
    const text = 'one two three four bevel six seven eight nine';
    // Window of 3 words centred on "bevel" (5th word): four bevel six.
    const out = formatHit({ body: text }, options({ highlight: null, crop: ['body'], cropLength: 3 }));
    expect(out['body']).toBe('…four bevel six…');
  });

  it('takes a crop length per attribute as attr:N', () => {
    const text = 'bevel two three four five';
    const out = formatHit({ body: text }, options({ crop: ['body:2'] }));
    expect(out['body']).toBe('<em>bevel</em> two…');
  });
});
