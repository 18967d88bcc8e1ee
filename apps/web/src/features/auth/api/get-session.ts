import { sessionSchema, type Session } from '@evenset/contracts';
import { ApiError, apiGet, setCsrfToken } from '../../../lib/api-client';

export const SESSION_KEY = '/auth/me';

/** Who is signed in, or null when nobody is (401 is an answer here, not an error). */
export async function getSession(): Promise<Session | null> {
  try {
    const session = await apiGet(SESSION_KEY, sessionSchema);
    setCsrfToken(session.csrfToken);
    return session;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}
