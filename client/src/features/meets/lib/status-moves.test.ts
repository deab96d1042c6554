import { describe, expect, it } from '@jest/globals';

import { statusMoves } from './status-moves.js';

describe('statusMoves', () => {
  it('offers a draft meet opening for entries or archiving, nothing else', () => {
    // shared/src/league/meet-status.ts: DRAFT → OPEN or ARCHIVED
    expect(statusMoves('DRAFT').map((move) => move.to)).toEqual(['OPEN', 'ARCHIVED']);
    expect(statusMoves('DRAFT')[0]!.action).toBe('Open for entries');
  });

  it('words the same target by where the meet comes from', () => {
    // shared rules: CLOSED → OPEN, CLOSED → RUNNING; RUNNING → CLOSED
    expect(statusMoves('CLOSED').find((move) => move.to === 'OPEN')!.action).toBe('Reopen entries');
    expect(statusMoves('OPEN').find((move) => move.to === 'CLOSED')!.action).toBe('Close entries');
    expect(statusMoves('RUNNING').find((move) => move.to === 'CLOSED')!.action).toBe('Stop the meet');
  });

  it('offers nothing once a meet is archived', () => {
    expect(statusMoves('ARCHIVED')).toEqual([]);
  });
});
