import { describe, expect, it } from '@jest/globals';

import { normaliseEmail, passwordProblem } from './password-policy.js';

describe('passwordProblem', () => {
  it('refuses a password shorter than ten characters', () => {
    expect(passwordProblem('short1234')).toMatch(/at least 10/);
  });

  it('refuses a common password whatever its case', () => {
    expect(passwordProblem('Password123')).toMatch(/commonly used/);
  });

  it('refuses a password that contains the e-mail name', () => {
    expect(passwordProblem('xx-rowan.hale-xx', { email: 'rowan.hale@example.org' })).toMatch(/e-mail/);
  });

  it('accepts a long uncommon passphrase', () => {
    expect(passwordProblem('green aspen splits clean')).toBeNull();
  });
});

describe('normaliseEmail', () => {
  it('trims and lower-cases an address', () => {
    expect(normaliseEmail('  Coach@Example.ORG ')).toBe('coach@example.org');
  });

  it('rejects text that is not an address', () => {
    expect(normaliseEmail('not-an-address')).toBeNull();
    expect(normaliseEmail('two words@example.org')).toBeNull();
  });
});
