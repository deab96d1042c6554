import { createHmac, timingSafeEqual } from 'node:crypto';

import { ApiError } from './api-error.js';

export interface ApiKey {
  uid: string;
  key: string;
  name: string;
  description: string;
  actions: string[];
  indexes: string[];
  expiresAt: null;
  createdAt: string;
  updatedAt: string;
}

/** Route actions, named as the service names them in its key objects. */
export type Action =
  | 'search' | 'indexes.get' | 'indexes.create' | 'indexes.update' | 'indexes.delete'
  | 'documents.add' | 'documents.get' | 'documents.delete' | 'settings.get' | 'settings.update'
  | 'tasks.get' | 'stats.get' | 'version' | 'keys.get';

function derive(masterKey: string, label: string): string {
  return createHmac('sha256', masterKey).update(label).digest('hex');
}

/** A UUID-shaped uid from the same derivation, so key uids stay put across restarts too. */
function uuidFrom(hex: string): string {
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-4${hex.slice(13, 16)}-a${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}

/**
 * The two default keys, derived from the master key so that every restart (and every
 * developer with the same master key) sees the same values. The names are the service's
 * own key names, which SDK users look keys up by.
 */
export function deriveApiKeys(masterKey: string, createdAt: string): ApiKey[] {
  const make = (label: string, name: string, description: string, actions: string[]): ApiKey => ({
    uid: uuidFrom(derive(masterKey, `${label}:uid`)),
    key: derive(masterKey, `${label}:key`),
    name,
    description,
    actions,
    indexes: ['*'],
    expiresAt: null,
    createdAt,
    updatedAt: createdAt,
  });
  return [
    make('endgrain-search', 'Default Search API Key', 'Search only: safe to hand to a browser.', ['search']),
    make('endgrain-admin', 'Default Admin API Key', 'Reads and writes indexes, documents and settings; keep it on the server.', ['*']),
  ];
}

function sameSecret(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}

/**
 * Checks the `Authorization` header for a route's action: the master key may do anything,
 * a derived key only its listed actions. Throws 401 with no key and 403 with a wrong one.
 */
export function authorize(header: string | undefined, action: Action, masterKey: string | null, keys: readonly ApiKey[]): void {
  if (masterKey === null) return;
  if (header === undefined || header.trim() === '') {
    throw new ApiError('missing_authorization_header', 'This route needs an `Authorization: Bearer <key>` header.');
  }
  const match = /^Bearer\s+(.+)$/i.exec(header.trim());
  const presented = match?.[1]?.trim() ?? '';
  if (sameSecret(presented, masterKey)) return;
  const key = keys.find((candidate) => sameSecret(presented, candidate.key));
  const allowed = key !== undefined && (key.actions.includes('*') || key.actions.includes(action));
  if (!allowed) throw new ApiError('invalid_api_key', 'The API key given is not valid for this route.');
}
