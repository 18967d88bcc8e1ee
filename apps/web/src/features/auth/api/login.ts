import { sessionSchema, type LoginInput, type Session } from '@evenset/contracts';
import { apiWrite, setCsrfToken } from '../../../lib/api-client';

export async function login(input: LoginInput): Promise<Session> {
  const session = await apiWrite('POST', '/auth/login', input, sessionSchema);
  // Signing in renews the session and with it the CSRF token.
  setCsrfToken(session.csrfToken);
  return session;
}
