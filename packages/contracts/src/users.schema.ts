import { z } from 'zod';
import { roleSchema } from './roles.schema';

export const LENGTH_UNITS = ['in', 'mm'] as const;
export const displayUnitSchema = z.enum(LENGTH_UNITS, { error: 'Choose inch or millimetre.' });
export type DisplayUnit = z.infer<typeof displayUnitSchema>;

export const emailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.com.' }));

export const PASSWORD_MIN_LENGTH = 10;
export const newPasswordSchema = z
  .string({ error: 'Enter a password.' })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(200, 'Use at most 200 characters.');

export const rolesSchema = z
  .array(roleSchema)
  .min(1, 'Give the person at least one role.')
  .refine((roles) => new Set(roles).size === roles.length, 'Each role can be given only once.');

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  roles: z.array(roleSchema),
  active: z.boolean(),
  displayUnit: displayUnitSchema,
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const displayNameSchema = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, 'Enter a name.')
  .max(100, 'Use at most 100 characters.');

export const createUserSchema = z.object({
  email: emailSchema,
  displayName: displayNameSchema,
  roles: rolesSchema,
  password: newPasswordSchema,
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const changeRolesSchema = z.object({ roles: rolesSchema });
export type ChangeRolesInput = z.infer<typeof changeRolesSchema>;

export const resetPasswordSchema = z.object({ password: newPasswordSchema });
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

/** `PATCH /api/me/preferences` (every signed-in person, for themselves) → SessionUser. */
export const preferencesSchema = z.object({ displayUnit: displayUnitSchema });
export type PreferencesInput = z.infer<typeof preferencesSchema>;
