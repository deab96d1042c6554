import { useApolloClient, useMutation, useQuery, skipToken } from '@apollo/client/react';
import { useCallback, useEffect, useMemo, useRef, useSyncExternalStore, type ReactNode } from 'react';

import { authToken } from '../../../lib/auth-token.js';
import { authDocuments } from '../api/auth-documents.js';
import type { AuthPayload, SignInInput, SignUpInput } from '../api/types.js';
import { AuthContext, type AuthContextValue, type AuthStatus } from '../hooks/auth-context.js';

export function AuthProvider({ children }: { children: ReactNode }) {
  const client = useApolloClient();
  const token = useSyncExternalStore(authToken.subscribe, authToken.get, () => null);
  // Without a token nobody is signed in: no need to ask the server.
  const me = useQuery(authDocuments.me, token ? { fetchPolicy: 'cache-first' } : skipToken);
  const [signInMutation] = useMutation(authDocuments.signIn);
  const [signUpMutation] = useMutation(authDocuments.signUp);

  // A token the server no longer recognises answers `me: null`: forget it.
  const meIsNull = me.data?.me === null;
  useEffect(() => {
    if (token && meIsNull) authToken.clear();
  }, [token, meIsNull]);

  // On the way out (sign-out, expired token, another tab), drop everything cached for that person.
  const previousToken = useRef(token);
  useEffect(() => {
    if (previousToken.current && !token) void client.clearStore();
    previousToken.current = token;
  }, [client, token]);

  const startSession = useCallback(
    (payload: AuthPayload | undefined) => {
      if (!payload) throw new Error('The server sent no session back.');
      // Cache the user before storing the token, so the `me` query is answered without a round trip.
      client.writeQuery({ query: authDocuments.me, data: { me: payload.user } });
      authToken.set(payload.accessToken);
      return payload.user;
    },
    [client],
  );

  const signIn = useCallback(
    async (input: SignInInput) => startSession((await signInMutation({ variables: { input } })).data?.signIn),
    [signInMutation, startSession],
  );
  const signUp = useCallback(
    async (input: SignUpInput) => startSession((await signUpMutation({ variables: { input } })).data?.signUp),
    [signUpMutation, startSession],
  );

  const user = token ? (me.data?.me ?? null) : null;
  let status: AuthStatus = 'signedOut';
  if (user) status = 'signedIn';
  else if (token && me.loading) status = 'loading';

  const value = useMemo<AuthContextValue>(
    () => ({ status, user, signIn, signUp, signOut: () => authToken.clear() }),
    [status, user, signIn, signUp],
  );
  return <AuthContext.Provider value={value}>{children}</AuthContext.Provider>;
}
