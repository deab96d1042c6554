import { createHash, randomBytes, randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { IsNull } from 'typeorm';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import { MailService } from '../mail/mail.service.js';
import { ClubMembershipEntity } from '../users/entities/club-membership.entity.js';
import { UserEntity } from '../users/entities/user.entity.js';
import { ClubsService } from './clubs.service.js';
import type { InviteToClubInput } from './dto/league.inputs.js';
import { ClubInvitationEntity } from './entities/club-invitation.entity.js';
import { LeagueRepository } from './league.repository.js';
import { email as validEmail } from './league.validation.js';
import type { ClubInvitationModel } from './models/club.model.js';
import { ClubRoleEnum } from './models/league.enums.js';

const INVITATION_DAYS = 14;
const sha256 = (token: string): string => createHash('sha256').update(token).digest('hex');

@Injectable()
export class InvitationsService {
  constructor(
    @Inject(LeagueRepository) private readonly league: LeagueRepository,
    @Inject(ClubsService) private readonly clubs: ClubsService,
    @Inject(MailService) private readonly mail: MailService,
  ) {}

  async list(actor: AuthUser, clubId: string): Promise<ClubInvitationModel[]> {
    this.clubs.assertCanManage(actor, clubId);
    const rows = await this.league.invitations.find({ where: { clubId }, order: { createdAt: 'DESC' } });
    return rows.map(toModel);
  }

  async invite(actor: AuthUser, input: InviteToClubInput, now = new Date()): Promise<ClubInvitationModel> {
    this.clubs.assertCanManage(actor, input.clubId);
    const club = await this.league.clubs.findOneBy({ id: input.clubId });
    if (!club) throw DomainError.notFound('That club');
    const address = validEmail('email', input.email)!;
    const token = randomBytes(32).toString('base64url');
    const row: ClubInvitationEntity = {
      id: randomUUID(),
      clubId: club.id,
      email: address,
      role: input.role,
      tokenHash: sha256(token),
      invitedBy: actor.id,
      expiresAt: new Date(now.getTime() + INVITATION_DAYS * 86400_000),
      acceptedAt: null,
      acceptedBy: null,
      createdAt: now,
    };
    await this.league.invitations.insert(row);
    const link = this.mail.link(`/join-club?token=${encodeURIComponent(token)}`);
    const what = input.role === 'COACH' ? 'a coach' : 'an athlete';
    await this.mail.send({
      to: address,
      subject: `You are invited to join ${club.name} on Endgrain`,
      text: `Hello,\n\n${club.name} has invited you to join them on Endgrain as ${what}.\nOpen this link to sign in or create an account and join (valid for ${INVITATION_DAYS} days, once):\n${link}\n\nIf you did not expect this, ignore this message.\n— Endgrain`,
    });
    return toModel(row);
  }

  async accept(actor: AuthUser, token: string, now = new Date()): Promise<string> {
    return this.league.db.transaction(async (m) => {
      const repo = m.getRepository(ClubInvitationEntity);
      const row = await repo.findOne({ where: { tokenHash: sha256(token ?? '') }, lock: { mode: 'pessimistic_write' } });
      if (!row || row.acceptedAt) throw new DomainError(ErrorCode.TokenInvalid, 'This invitation is not valid or has already been used.', { field: 'token' });
      if (row.expiresAt.getTime() < now.getTime()) throw new DomainError(ErrorCode.TokenInvalid, 'This invitation has expired. Ask the club for a new one.', { field: 'token' });
      if (row.email !== actor.email) {
        throw DomainError.forbidden(`This invitation was sent to ${row.email}. Sign in with that address to accept it.`);
      }
      await repo.update({ id: row.id, acceptedAt: IsNull() }, { acceptedAt: now, acceptedBy: actor.id });
      const memberships = m.getRepository(ClubMembershipEntity);
      const existing = await memberships.findOneBy({ userId: actor.id, clubId: row.clubId });
      if (existing) {
        if (row.role === 'COACH' && existing.role !== 'COACH') await memberships.update({ id: existing.id }, { role: 'COACH' });
      } else {
        await memberships.insert({ id: randomUUID(), userId: actor.id, clubId: row.clubId, role: row.role });
      }
      if (row.role === 'COACH') {
        await m.getRepository(UserEntity).update({ id: actor.id, role: 'ATHLETE' }, { role: 'COACH' });
      }
      return row.clubId;
    });
  }
}

function toModel(row: ClubInvitationEntity): ClubInvitationModel {
  return { id: row.id, email: row.email, role: ClubRoleEnum[row.role], expiresAt: row.expiresAt, acceptedAt: row.acceptedAt };
}
