import { createHash, randomBytes, randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { DataSource, IsNull, type EntityManager } from 'typeorm';

import { DomainError } from '../common/errors/domain-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import { EmailTokenEntity, type EmailTokenPurpose } from './entities/email-token.entity.js';

const LIFETIME_MS: Record<EmailTokenPurpose, number> = {
  VERIFY_EMAIL: 48 * 3600_000,
  RESET_PASSWORD: 3600_000,
};

const sha256 = (token: string): string => createHash('sha256').update(token).digest('hex');

/** Issues and redeems single-use e-mail tokens; the database only ever sees their hash. */
@Injectable()
export class EmailTokensService {
  constructor(@Inject(DataSource) private readonly db: DataSource) {}

  async issue(userId: string, purpose: EmailTokenPurpose, now = new Date()): Promise<string> {
    const token = randomBytes(32).toString('base64url');
    await this.db.getRepository(EmailTokenEntity).insert({
      id: randomUUID(),
      userId,
      purpose,
      tokenHash: sha256(token),
      expiresAt: new Date(now.getTime() + LIFETIME_MS[purpose]),
      usedAt: null,
    });
    return token;
  }

  /** Marks the token used inside the caller's transaction and returns its user id. */
  async redeem(manager: EntityManager, token: string, purpose: EmailTokenPurpose, now = new Date()): Promise<string> {
    const repo = manager.getRepository(EmailTokenEntity);
    const row = await repo.findOne({
      where: { tokenHash: sha256(token), purpose },
      lock: { mode: 'pessimistic_write' },
    });
    if (!row || row.usedAt) throw invalid(purpose, 'This link is not valid or has already been used.');
    if (row.expiresAt.getTime() < now.getTime()) throw invalid(purpose, 'This link has expired. Ask for a new one.');
    await repo.update({ id: row.id }, { usedAt: now });
    // Older links of the same kind stop working once one is used.
    await repo.update({ userId: row.userId, purpose, usedAt: IsNull() }, { usedAt: now });
    return row.userId;
  }
}

function invalid(purpose: EmailTokenPurpose, message: string): DomainError {
  return new DomainError(ErrorCode.TokenInvalid, message, { field: purpose === 'VERIFY_EMAIL' ? 'token' : 'token' });
}
