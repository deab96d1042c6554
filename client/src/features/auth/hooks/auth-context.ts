import { createContext } from 'react';

import type { SignInInput, SignUpInput, User } from '../api/types.js';

export type AuthStatus = 'loading' | 'signedIn' | 'signedOut';

export interface AuthContextValue {
  status: AuthStatus;
  user: User | null;
  /** Rejects with the Apollo error so a form can show the server's message. */
  signIn(input: SignInInput): Promise<User>;
  signUp(input: SignUpInput): Promise<User>;
  signOut(): void;
}

export const AuthContext = createContext<AuthContextValue | null>(null);
