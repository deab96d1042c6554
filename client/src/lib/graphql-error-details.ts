import { CombinedGraphQLErrors } from '@apollo/client/errors';

export interface GraphQLErrorDetails {
  /** The server's `extensions.code`, e.g. INVALID_CREDENTIALS; NETWORK when no answer came back. */
  code: string;
  /** The input field the server named (`extensions.field`), if any. */
  field?: string;
  message: string;
}

const NETWORK_MESSAGE = "Endgrain's server could not be reached. Check your connection and try again.";

/** Reads every error the server returned; a failure without GraphQL errors counts as one network error. */
export function graphQLErrorDetails(error: unknown): GraphQLErrorDetails[] {
  if (CombinedGraphQLErrors.is(error)) {
    return error.errors.map((item) => {
      const code = item.extensions?.['code'];
      const field = item.extensions?.['field'];
      return {
        code: typeof code === 'string' ? code : 'UNKNOWN',
        ...(typeof field === 'string' ? { field } : {}),
        message: item.message,
      };
    });
  }
  return [{ code: 'NETWORK', message: NETWORK_MESSAGE }];
}

export function hasErrorCode(error: unknown, code: string): boolean {
  return CombinedGraphQLErrors.is(error) && graphQLErrorDetails(error).some((item) => item.code === code);
}
