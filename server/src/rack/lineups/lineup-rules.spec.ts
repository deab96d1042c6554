import { describe, expect, it } from '@jest/globals';

import { checkLineup, type LineupCheck } from './lineup-rules.js';

// The rules are the product's own, from the Rack issue: experienced-only axes to a rookie or a
// developing athlete need a recorded override; loose head, needs handle and retired refuse;
// needs edge warns; one axe to two athletes in the same heat warns.
const rookie = { name: 'Tamsin Reedy', experience: 'ROOKIE' as const };
const veteran = { name: 'Orrin Blackwell', experience: 'EXPERIENCED' as const };
const axe = (over: Partial<NonNullable<LineupCheck['axe']>> = {}) => ({ label: 'Race 3', status: 'READY' as const, allowedFor: 'ANYONE' as const, ...over });
const check = (over: Partial<LineupCheck>) => checkLineup({ athlete: veteran, axe: axe(), overrideReason: null, sameHeatAthletes: [], ...over });

describe('checkLineup', () => {
  it('hands a ready axe for anyone to anyone without a word', () => {
    expect(check({ athlete: rookie })).toEqual({ ok: true, warnings: [], overrideUsed: false });
  });

  it.each([
    ['HEAD_LOOSE', 'Race 3 has a loose head'],
    ['NEEDS_HANDLE', 'Race 3 needs a new handle'],
    ['RETIRED', 'Race 3 is retired'],
  ] as const)('refuses an axe whose status is %s', (status, message) => {
    expect(check({ axe: axe({ status }) })).toEqual({ ok: false, field: 'axeId', message: expect.stringContaining(message) });
  });

  it('refuses an experienced-only axe to a rookie without an override reason', () => {
    const verdict = check({ athlete: rookie, axe: axe({ allowedFor: 'EXPERIENCED_ONLY' }) });
    expect(verdict).toEqual({ ok: false, field: 'overrideReason', message: expect.stringContaining('Race 3 is for experienced athletes only; Tamsin Reedy is a rookie.') });
  });

  it('refuses an experienced-only axe to a developing athlete without an override reason', () => {
    const verdict = check({ athlete: { name: 'Wynn Hollis', experience: 'DEVELOPING' }, axe: axe({ allowedFor: 'EXPERIENCED_ONLY' }) });
    expect(verdict.ok).toBe(false);
  });

  it('refuses a reason too short to say anything', () => {
    expect(check({ athlete: rookie, axe: axe({ allowedFor: 'EXPERIENCED_ONLY' }), overrideReason: '  ok  ' })).toMatchObject({ ok: false, field: 'overrideReason' });
  });

  it('accepts the override with a reason, says so and marks it for the record', () => {
    const verdict = check({ athlete: rookie, axe: axe({ allowedFor: 'EXPERIENCED_ONLY' }), overrideReason: 'Coached on this axe all autumn' });
    expect(verdict).toEqual({ ok: true, overrideUsed: true, warnings: [expect.stringContaining('Override recorded: "Coached on this axe all autumn"')] });
  });

  it('lets a developing athlete take a developing-and-up axe but not a rookie', () => {
    expect(check({ athlete: { name: 'Wynn Hollis', experience: 'DEVELOPING' }, axe: axe({ allowedFor: 'DEVELOPING_UP' }) }).ok).toBe(true);
    expect(check({ athlete: rookie, axe: axe({ allowedFor: 'DEVELOPING_UP' }) }).ok).toBe(false);
  });

  it('warns when the axe needs an edge', () => {
    expect(check({ axe: axe({ status: 'NEEDS_EDGE' }) })).toEqual({ ok: true, overrideUsed: false, warnings: ['Race 3 needs an edge: regrind or hone it before the meet, or pick another axe.'] });
  });

  it('warns when the same axe goes to another athlete in the same heat', () => {
    const verdict = check({ sameHeatAthletes: ['Tamsin Reedy'] });
    expect(verdict).toEqual({ ok: true, overrideUsed: false, warnings: [expect.stringContaining('Race 3 is also given to Tamsin Reedy in the same heat')] });
  });

  it('passes an entry with no axe (a saw event, or not chosen yet)', () => {
    expect(check({ axe: null, athlete: rookie })).toEqual({ ok: true, warnings: [], overrideUsed: false });
  });
});
