import { canManageClub, canReachClub } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import type { AxeEntity } from './entities/axe.entity.js';

/** Members (and admins) see the whole rack; everyone else only the axes the club made public. */
export function canSeeAxe(actor: AuthUser | null, axe: Pick<AxeEntity, 'clubId' | 'isPublic'>): boolean {
  return Boolean(axe.isPublic) || canReachClub(actor, axe.clubId);
}

/**
 * A private axe is "not found" to outsiders, so its existence does not leak; a visible one
 * that the caller may not edit is "forbidden".
 */
export function assertCanEditAxe(actor: AuthUser, axe: Pick<AxeEntity, 'clubId' | 'isPublic'>): void {
  if (!canSeeAxe(actor, axe)) throw DomainError.notFound('That axe');
  if (!canManageClub(actor, axe.clubId)) throw DomainError.forbidden("Only this club's coaches can change its rack.");
}
