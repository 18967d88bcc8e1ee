import { CSRF_HEADER } from '@evenset/contracts';
import type { Request } from 'express';
import { csrfSync } from 'csrf-sync';

/**
 * Synchroniser-token CSRF protection: the token lives in the server-side session and must come
 * back in a header on every state-changing request (sign-in included).
 */
export const csrf = csrfSync({
  getTokenFromRequest: (req: Request) => {
    const value = req.headers[CSRF_HEADER];
    return typeof value === 'string' ? value : undefined;
  },
});
