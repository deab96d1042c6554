import { describe, expect, it } from '@jest/globals';

import { highlightParts } from './highlight-parts.js';

describe('highlightParts', () => {
  it('splits marked words from plain text', () => {
    expect(highlightParts('green \uE000poplar\uE001 blocks')).toEqual([
      { text: 'green ', marked: false },
      { text: 'poplar', marked: true },
      { text: ' blocks', marked: false },
    ]);
  });

  it('keeps markup in document text as plain text', () => {
    expect(highlightParts('<img onerror=x> \uE000aspen\uE001')).toEqual([
      { text: '<img onerror=x> ', marked: false },
      { text: 'aspen', marked: true },
    ]);
  });

  it('treats an unclosed marker as marking the rest', () => {
    expect(highlightParts('a \uE000b')).toEqual([
      { text: 'a ', marked: false },
      { text: 'b', marked: true },
    ]);
  });
});
