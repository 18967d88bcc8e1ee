import { z } from 'zod';
import { displayUnitSchema } from './users.schema';
import { roleSchema } from './roles.schema';

export const loginSchema = z.object({
  email: z.string({ error: 'Enter your e-mail address.' }).trim().min(1, 'Enter your e-mail address.'),
  password: z.string({ error: 'Enter your password.' }).min(1, 'Enter your password.'),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const sessionUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  roles: z.array(roleSchema),
  displayUnit: displayUnitSchema,
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

/** Answer of sign-in and of `GET /api/auth/me`: who is signed in and the CSRF token for writes. */
export const sessionSchema = z.object({
  user: sessionUserSchema,
  csrfToken: z.string(),
});
export type Session = z.infer<typeof sessionSchema>;

export const csrfTokenSchema = z.object({ csrfToken: z.string() });

/** The header that carries the CSRF token on every state-changing request. */
export const CSRF_HEADER = 'x-csrf-token';
