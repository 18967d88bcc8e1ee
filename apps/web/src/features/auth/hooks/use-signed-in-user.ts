import type { SessionUser } from '@evenset/contracts';
import { useAuth } from './use-auth';

/** The signed-in person, for pages behind <RequireAuth> (which renders them only then). */
export function useSignedInUser(): SessionUser {
  const { state } = useAuth();
  if (state.status !== 'signed-in') throw new Error('useSignedInUser is for pages behind <RequireAuth>.');
  return state.user;
}
