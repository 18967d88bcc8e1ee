import { ApiError, apiWrite, setCsrfToken } from '../../../lib/api-client';

export async function logout(): Promise<void> {
  try {
    await apiWrite('POST', '/auth/logout');
  } catch (error) {
    // An already-ended session is as good as signed out; anything else must be retried.
    if (!(error instanceof ApiError && error.status === 401)) throw error;
  }
  // The old token died with the session; the next write fetches a new one.
  setCsrfToken(null);
}
