import { userSchema, type CreateUserInput, type User } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function createUser(input: CreateUserInput): Promise<User> {
  return apiWrite('POST', '/users', input, userSchema);
}
