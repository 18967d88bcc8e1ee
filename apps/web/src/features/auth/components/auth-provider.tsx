import type { LoginInput, Session } from '@evenset/contracts';
import { useCallback, useEffect, useMemo, useState, type ReactNode } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import { setUnauthorizedHandler, type ApiError } from '../../../lib/api-client';
import { getSession, SESSION_KEY } from '../api/get-session';
import { login } from '../api/login';
import { logout } from '../api/logout';
import { AuthContext, type Auth, type AuthState } from '../hooks/use-auth';

/** Holds who is signed in (from GET /api/auth/me) and the sign-in and sign-out actions. */
export function AuthProvider({ children }: { children: ReactNode }) {
  const { mutate: mutateAny } = useSWRConfig();
  const { data: session, error, mutate } = useSWR<Session | null, ApiError>(SESSION_KEY, getSession);
  const [signedOutByChoice, setSignedOutByChoice] = useState(false);

  // Whatever request finds the session gone, the route guard then sends the person to sign in.
  useEffect(() => setUnauthorizedHandler(() => void mutate(null, { revalidate: false })), [mutate]);

  // Nothing read under one person may be shown to the next.
  const forgetEverythingElse = useCallback(
    () => mutateAny((key) => key !== SESSION_KEY, undefined, { revalidate: false }),
    [mutateAny],
  );

  const signIn = useCallback(
    async (input: LoginInput) => {
      const next = await login(input);
      await forgetEverythingElse();
      setSignedOutByChoice(false);
      await mutate(next, { revalidate: false });
    },
    [forgetEverythingElse, mutate],
  );

  const signOut = useCallback(async () => {
    await logout();
    setSignedOutByChoice(true);
    await mutate(null, { revalidate: false });
    await forgetEverythingElse();
  }, [forgetEverythingElse, mutate]);

  const state = useMemo((): AuthState => {
    if (session) return { status: 'signed-in', user: session.user };
    if (session === null) return { status: 'signed-out', byChoice: signedOutByChoice };
    if (error) return { status: 'unavailable', error };
    return { status: 'loading' };
  }, [session, error, signedOutByChoice]);

  const auth = useMemo<Auth>(
    () => ({ state, signIn, signOut, retry: () => void mutate() }),
    [state, signIn, signOut, mutate],
  );

  return <AuthContext.Provider value={auth}>{children}</AuthContext.Provider>;
}
