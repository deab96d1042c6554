import type { Role } from './roles.js';

export interface Actor {
  role: Role;
  /** Clubs where the actor is a coach or athlete (club-scoped roles). */
  clubIds?: readonly string[];
}

/**
 * Whether an actor holds one of the required roles. An admin may do everything.
 * The server guard binds on this; the client uses it only to hide buttons.
 */
export function isAllowed(actor: Actor | null | undefined, required: readonly Role[]): boolean {
  if (!actor) return false;
  if (actor.role === 'ADMIN') return true;
  return required.includes(actor.role);
}

/** Club-scoped check: coaches and athletes reach only their own clubs; admins every club. */
export function canReachClub(actor: Actor | null | undefined, clubId: string): boolean {
  if (!actor) return false;
  if (actor.role === 'ADMIN') return true;
  return (actor.clubIds ?? []).includes(clubId);
}

/** Coaches manage their own club's roster, rack, trials and entries; admins every club's. */
export function canManageClub(actor: Actor | null | undefined, clubId: string): boolean {
  if (!actor) return false;
  if (actor.role === 'ADMIN') return true;
  return actor.role === 'COACH' && (actor.clubIds ?? []).includes(clubId);
}

/** Organisers and admins build and run meets. */
export function canRunMeets(actor: Actor | null | undefined): boolean {
  return isAllowed(actor, ['ORGANISER']);
}
