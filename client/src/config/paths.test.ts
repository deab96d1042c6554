import { describe, expect, it } from '@jest/globals';

import { paths, safeReturnPath } from './paths.js';

describe('paths', () => {
  it('carries the return path to sign-in as a query parameter', () => {
    // hand-worked: URLSearchParams encodes "/" as %2F
    expect(paths.auth.signIn.href('/account')).toBe('/sign-in?returnTo=%2Faccount');
  });

  it('drops a return path that would leave the site', () => {
    // hand-worked: "//evil.example.org" is a protocol-relative URL to another host
    expect(paths.auth.signIn.href('//evil.example.org')).toBe('/sign-in');
    expect(safeReturnPath('https://evil.example.org/')).toBeUndefined();
    expect(safeReturnPath('/\\evil.example.org')).toBeUndefined();
  });

  it('keeps a same-site return path with its query', () => {
    expect(safeReturnPath('/rack?status=ready')).toBe('/rack?status=ready');
  });

  it('builds a search link with the trimmed words and none for blank words', () => {
    // hand-worked: spaces encode as "+" in application/x-www-form-urlencoded
    expect(paths.search.href('  wet poplar ')).toBe('/search?q=wet+poplar');
    expect(paths.search.href('   ')).toBe('/search');
  });
});
