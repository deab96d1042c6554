import { Inject, Injectable } from '@nestjs/common';
import { canRunMeets, normaliseEmail } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { MeetsRepository } from './meets.repository.js';
import type { MeetTimekeeperModel } from './models/meet.model.js';

export const MAX_TIMEKEEPERS = 20;
export const POST_REFUSAL = "Only organisers and this meet's appointed timekeepers post its results.";

/**
 * Timekeepers: people an organiser appoints for one meet. They post and upload that meet's
 * results until it is published; correcting published results and publishing stay with organisers.
 */
@Injectable()
export class TimekeepersService {
  constructor(@Inject(MeetsRepository) private readonly repo: MeetsRepository) {}

  /** Organisers, and the timekeepers of this meet, may post its results. */
  async canPost(actor: AuthUser | null, meetId: string): Promise<boolean> {
    if (!actor) return false;
    return canRunMeets(actor) || this.repo.isTimekeeper(meetId, actor.id);
  }

  async isTimekeeper(actor: AuthUser | null, meetId: string): Promise<boolean> {
    return actor ? this.repo.isTimekeeper(meetId, actor.id) : false;
  }

  async list(meetId: string): Promise<MeetTimekeeperModel[]> {
    await this.mustFindMeet(meetId);
    return this.repo.timekeepersOf(meetId);
  }

  async appoint(actor: AuthUser, meetId: string, rawEmail: string): Promise<MeetTimekeeperModel[]> {
    const meet = await this.mustFindMeet(meetId);
    if (meet.status === 'PUBLISHED' || meet.status === 'ARCHIVED') {
      throw DomainError.badInput('meetId', 'These results are published; corrections are made by organisers, so no timekeepers are needed.');
    }
    const email = normaliseEmail(rawEmail);
    if (!email) throw DomainError.badInput('email', 'Enter the timekeeper’s e-mail address, like name@example.org.');
    const user = await this.repo.findUserByEmail(email);
    if (!user) throw DomainError.badInput('email', `No Endgrain account uses ${email}. Ask them to sign up first, then appoint them.`);
    const current = await this.repo.timekeepersOf(meetId);
    if (current.some((t) => t.userId === user.id)) throw DomainError.badInput('email', `${user.displayName} is already a timekeeper for this meet.`);
    if (current.length >= MAX_TIMEKEEPERS) throw DomainError.badInput('email', `A meet has at most ${MAX_TIMEKEEPERS} timekeepers.`);
    await this.repo.timekeepers.insert({ meetId, userId: user.id, appointedBy: actor.id });
    return this.repo.timekeepersOf(meetId);
  }

  async remove(meetId: string, userId: string): Promise<MeetTimekeeperModel[]> {
    await this.mustFindMeet(meetId);
    const removed = await this.repo.timekeepers.delete({ meetId, userId });
    if (!removed.affected) throw DomainError.notFound('That timekeeper');
    return this.repo.timekeepersOf(meetId);
  }

  private async mustFindMeet(meetId: string) {
    const meet = await this.repo.meets.findOne({ where: { id: meetId }, select: { id: true, status: true } });
    if (!meet) throw DomainError.notFound('That meet');
    return meet;
  }
}
