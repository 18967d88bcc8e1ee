import { z } from 'zod';
import { displayUnitSchema, emailSchema, newPasswordSchema } from './users.schema';
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

/** Asking for a reset link by e-mail; the answer never tells whether the address has an account. */
export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequestInput = z.infer<typeof passwordResetRequestSchema>;

export const PASSWORD_RESET_REQUESTED_MESSAGE = 'If that address belongs to an active account, a link is on its way.';

export const passwordResetConfirmSchema = z.object({
  token: z.string({ error: 'The reset link is incomplete.' }).trim().min(1, 'The reset link is incomplete.').max(200),
  password: newPasswordSchema,
});
export type PasswordResetConfirmInput = z.infer<typeof passwordResetConfirmSchema>;
