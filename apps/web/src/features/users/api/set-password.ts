import type { ResetPasswordInput } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function setPassword(userId: string, input: ResetPasswordInput): Promise<void> {
  return apiWrite('POST', `/users/${encodeURIComponent(userId)}/password`, input);
}
