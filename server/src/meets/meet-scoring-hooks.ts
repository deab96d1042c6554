import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';

export interface ScoringChange {
  userId: string;
  /** The organiser's reason, as recorded with the change. */
  reason: string;
}

export type ScoringChangedHook = (m: EntityManager, meetId: string, change: ScoringChange) => Promise<void>;

/**
 * Lets the results feature re-rank a meet inside the transaction that changes its scoring,
 * without the meets feature depending on results (which itself depends on meets).
 */
@Injectable()
export class MeetScoringHooks {
  private readonly hooks: ScoringChangedHook[] = [];

  register(hook: ScoringChangedHook): void {
    this.hooks.push(hook);
  }

  async scoringChanged(m: EntityManager, meetId: string, change: ScoringChange): Promise<void> {
    for (const hook of this.hooks) await hook(m, meetId, change);
  }
}
