import type { LoginInput, SessionUser } from '@evenset/contracts';
import { createContext, useContext } from 'react';
import type { ApiError } from '../../../lib/api-client';

export type AuthState =
  | { status: 'loading' }
  | { status: 'signed-in'; user: SessionUser }
  /** `byChoice`: the person pressed Sign out, so there is no page to return to afterwards. */
  | { status: 'signed-out'; byChoice: boolean }
  | { status: 'unavailable'; error: ApiError };

export interface Auth {
  state: AuthState;
  signIn: (input: LoginInput) => Promise<void>;
  signOut: () => Promise<void>;
  retry: () => void;
}

export const AuthContext = createContext<Auth | null>(null);

export function useAuth(): Auth {
  const auth = useContext(AuthContext);
  if (!auth) throw new Error('useAuth must be used inside <AuthProvider>.');
  return auth;
}
