import { ApiError } from './api-error.js';
import type { Action, ApiKey } from './api-keys.js';
import type { Engine } from './engine.js';

export interface RouteContext {
  engine: Engine;
  params: Record<string, string>;
  query: URLSearchParams;
  body: unknown;
  masterKey: string | null;
  keys: readonly ApiKey[];
}

export interface Reply {
  status: number;
  body: unknown;
}

export interface Route {
  method: string;
  segments: string[];
  /** The key action the route needs; null for routes open to all (health). */
  action: Action | null;
  /** Document bodies: malformed JSON answers `malformed_payload`, and NDJSON is accepted. */
  documents: boolean;
  handle(context: RouteContext): Reply;
}

export function route(
  method: string,
  path: string,
  action: Action | null,
  handle: (context: RouteContext) => Reply,
  options: { documents?: boolean } = {},
): Route {
  return { method, segments: path.split('/').filter(Boolean), action, documents: options.documents ?? false, handle };
}

export const ok = (body: unknown): Reply => ({ status: 200, body });
export const accepted = (body: unknown): Reply => ({ status: 202, body });

function matchSegments(route: Route, parts: string[]): Record<string, string> | null {
  if (route.segments.length !== parts.length) return null;
  const params: Record<string, string> = {};
  for (let i = 0; i < parts.length; i += 1) {
    const pattern = route.segments[i] as string;
    const part = parts[i] as string;
    if (pattern.startsWith(':')) params[pattern.slice(1)] = part;
    else if (pattern !== part) return null;
  }
  return params;
}

/** Finds the route for a request: 404 for an unknown path, 405 for a known path with another method. */
export function matchRoute(routes: readonly Route[], method: string, pathname: string): { route: Route; params: Record<string, string> } {
  let parts: string[];
  try {
    parts = pathname.split('/').filter(Boolean).map(decodeURIComponent);
  } catch {
    throw new ApiError('bad_request', `The path \`${pathname}\` is not valid percent-encoding.`);
  }
  let pathKnown = false;
  for (const candidate of routes) {
    const params = matchSegments(candidate, parts);
    if (params === null) continue;
    pathKnown = true;
    if (candidate.method === method) return { route: candidate, params };
  }
  if (pathKnown) throw new ApiError('method_not_allowed', `${method} is not allowed on \`${pathname}\`.`);
  throw new ApiError('route_not_found', `No route \`${method} ${pathname}\`.`);
}
