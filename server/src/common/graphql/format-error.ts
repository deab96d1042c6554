import type { GraphQLFormattedError } from 'graphql';

import { ErrorCode } from '../errors/error-code.js';

const KNOWN = new Set<string>([
  ...Object.values(ErrorCode),
  'GRAPHQL_PARSE_FAILED',
  'GRAPHQL_VALIDATION_FAILED',
  'BAD_REQUEST',
  'PERSISTED_QUERY_NOT_FOUND',
]);

/** No stack traces, no internals: unknown errors become a plain "something went wrong". */
export function formatGraphqlError(formatted: GraphQLFormattedError, original: unknown): GraphQLFormattedError {
  const code = String(formatted.extensions?.code ?? '');
  if (KNOWN.has(code)) {
    const { stacktrace: _drop, ...extensions } = formatted.extensions ?? {};
    return { message: formatted.message, locations: formatted.locations, path: formatted.path, extensions };
  }
  if (process.env.NODE_ENV !== 'test') console.error('[graphql] unexpected error', original);
  return {
    message: 'Something went wrong on our side. Please try again.',
    path: formatted.path,
    extensions: { code: 'INTERNAL_SERVER_ERROR' },
  };
}
