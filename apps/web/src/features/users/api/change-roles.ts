import { userSchema, type ChangeRolesInput, type User } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function changeRoles(userId: string, input: ChangeRolesInput): Promise<User> {
  return apiWrite('PUT', `/users/${encodeURIComponent(userId)}/roles`, input, userSchema);
}
