import { ApolloClient, ApolloLink, HttpLink, InMemoryCache } from '@apollo/client';
import { SetContextLink } from '@apollo/client/link/context';
import { ErrorLink } from '@apollo/client/link/error';

import { authToken } from './auth-token.js';
import { hasErrorCode } from './graphql-error-details.js';

// Same origin: the server serves the client, and Vite proxies /graphql in development.
const GRAPHQL_PATH = '/graphql';

const authLink = new SetContextLink((prevContext) => {
  const token = authToken.get();
  if (!token) return {};
  return { headers: { ...prevContext['headers'], authorization: `Bearer ${token}` } };
});

// A rejected token is useless from here on: drop it so the app shows the signed-out state.
const signOutOnRejectedToken = new ErrorLink(({ error }) => {
  if (hasErrorCode(error, 'UNAUTHENTICATED')) authToken.clear();
});

export interface ApolloClientOptions {
  /** The terminating link; tests pass a fake one instead of HTTP. */
  transport?: ApolloLink;
}

export function createApolloClient(options: ApolloClientOptions = {}): ApolloClient {
  const transport = options.transport ?? new HttpLink({ uri: GRAPHQL_PATH });
  return new ApolloClient({
    link: ApolloLink.from([signOutOnRejectedToken, authLink, transport]),
    cache: new InMemoryCache({
      typePolicies: {
        // A membership has no id of its own; it belongs inside its user.
        ClubMembership: { keyFields: false },
        // A note's working copy and its published text share an id: keep them apart.
        FieldNote: { keyFields: ['id', 'isDraftView'] },
      },
    }),
  });
}
