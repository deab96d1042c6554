import { ApolloLink, gql } from '@apollo/client';
import { describe, expect, it } from '@jest/globals';
import { of } from 'rxjs';

import { createApolloClient } from './apollo.js';
import { AUTH_TOKEN_KEY } from './auth-token.js';

const ME = gql`
  query Me {
    me {
      id
    }
  }
`;

function fakeServer(result: ApolloLink.Result) {
  const seenHeaders: Array<Record<string, string> | undefined> = [];
  const transport = new ApolloLink((operation) => {
    seenHeaders.push(operation.getContext()['headers'] as Record<string, string> | undefined);
    return of(result);
  });
  return { transport, seenHeaders };
}

describe('createApolloClient', () => {
  it('sends the stored token as a bearer authorization header', async () => {
    window.localStorage.setItem(AUTH_TOKEN_KEY, 'token-abc');
    const server = fakeServer({ data: { me: { __typename: 'User', id: 'u1' } } });
    await createApolloClient({ transport: server.transport }).query({ query: ME });
    expect(server.seenHeaders[0]?.['authorization']).toBe('Bearer token-abc');
  });

  it('sends no authorization header when signed out', async () => {
    const server = fakeServer({ data: { me: null } });
    await createApolloClient({ transport: server.transport }).query({ query: ME });
    expect(server.seenHeaders[0]?.['authorization']).toBeUndefined();
  });

  it('clears the stored token when the server answers UNAUTHENTICATED', async () => {
    window.localStorage.setItem(AUTH_TOKEN_KEY, 'expired');
    const server = fakeServer({
      data: null,
      errors: [{ message: 'Please sign in again.', extensions: { code: 'UNAUTHENTICATED' } }],
    });
    await expect(createApolloClient({ transport: server.transport }).query({ query: ME })).rejects.toThrow(
      'Please sign in again.',
    );
    expect(window.localStorage.getItem(AUTH_TOKEN_KEY)).toBeNull();
  });

  it('keeps the token on other errors', async () => {
    window.localStorage.setItem(AUTH_TOKEN_KEY, 'still-good');
    const server = fakeServer({
      data: null,
      errors: [{ message: 'Not allowed for your role.', extensions: { code: 'FORBIDDEN' } }],
    });
    await expect(createApolloClient({ transport: server.transport }).query({ query: ME })).rejects.toThrow();
    expect(window.localStorage.getItem(AUTH_TOKEN_KEY)).toBe('still-good');
  });
});
