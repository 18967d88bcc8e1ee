import { userSchema, type User } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

/** Deactivating keeps the person and their records; it only stops them signing in. */
export function setAccountActive(userId: string, active: boolean): Promise<User> {
  const action = active ? 'reactivate' : 'deactivate';
  return apiWrite('POST', `/users/${encodeURIComponent(userId)}/${action}`, undefined, userSchema);
}
