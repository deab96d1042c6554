import { createHmac } from 'node:crypto';

import { describe, expect, it } from '@jest/globals';

import { type ApiError } from './api-error.js';
import { authorize, deriveApiKeys } from './api-keys.js';

const CREATED = '2026-01-02T03:04:05.000Z';

function refusal(call: () => void): string | undefined {
  try {
    call();
  } catch (error) {
    return (error as ApiError).code;
  }
  return undefined;
}

describe('deriveApiKeys', () => {
  it('derives the same keys from the same master key, and other keys from another', () => {
    const first = deriveApiKeys('master-one-0123456789', CREATED);
    expect(deriveApiKeys('master-one-0123456789', CREATED)).toEqual(first);
    const other = deriveApiKeys('master-two-0123456789', CREATED);
    expect(other.map((key) => key.key)).not.toEqual(first.map((key) => key.key));
  });

  it('makes each key the hex HMAC-SHA256 of a fixed label under the master key', () => {
    const [search] = deriveApiKeys('master-one-0123456789', CREATED);
    // The documented derivation, recomputed with Node's HMAC (RFC 2104).
    expect(search?.key).toBe(createHmac('sha256', 'master-one-0123456789').update('endgrain-search:key').digest('hex'));
    expect(search?.uid).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-a[0-9a-f]{3}-[0-9a-f]{12}$/);
  });
});

describe('authorize', () => {
  const keys = deriveApiKeys('master-one-0123456789', CREATED);
  const [search, admin] = keys;

  it('lets anything through when no master key is set', () => {
    expect(refusal(() => authorize(undefined, 'documents.add', null, []))).toBeUndefined();
  });

  it('needs a header once a master key is set', () => {
    expect(refusal(() => authorize(undefined, 'search', 'master-one-0123456789', keys))).toBe('missing_authorization_header');
  });

  it('gives the search key search only', () => {
    expect(refusal(() => authorize(`Bearer ${search?.key}`, 'search', 'master-one-0123456789', keys))).toBeUndefined();
    expect(refusal(() => authorize(`Bearer ${search?.key}`, 'documents.add', 'master-one-0123456789', keys))).toBe('invalid_api_key');
  });

  it('gives the admin key and the master key every action', () => {
    expect(refusal(() => authorize(`Bearer ${admin?.key}`, 'settings.update', 'master-one-0123456789', keys))).toBeUndefined();
    expect(refusal(() => authorize('Bearer master-one-0123456789', 'keys.get', 'master-one-0123456789', keys))).toBeUndefined();
  });

  it('refuses a key that is not bearer or not known', () => {
    expect(refusal(() => authorize('Basic abc', 'search', 'master-one-0123456789', keys))).toBe('invalid_api_key');
    expect(refusal(() => authorize('Bearer master-one', 'search', 'master-one-0123456789', keys))).toBe('invalid_api_key');
  });
});
