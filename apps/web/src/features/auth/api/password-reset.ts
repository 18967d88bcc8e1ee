import type { PasswordResetConfirmInput, PasswordResetRequestInput } from '@evenset/contracts';
import { z } from 'zod';
import { apiWrite } from '../../../lib/api-client';

const requestedSchema = z.object({ message: z.string() });

/** The answer is the same whether or not the address has an account. */
export async function requestPasswordReset(input: PasswordResetRequestInput): Promise<string> {
  return (await apiWrite('POST', '/auth/password-reset', input, requestedSchema)).message;
}

export function confirmPasswordReset(input: PasswordResetConfirmInput): Promise<void> {
  return apiWrite('POST', '/auth/password-reset/confirm', input);
}
