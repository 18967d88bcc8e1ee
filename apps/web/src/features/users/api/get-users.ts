import { pageOf, userSchema, type ListQuery, type Page, type User } from '@evenset/contracts';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

const USERS_PATH = '/users';
const usersPageSchema = pageOf(userSchema);

export function useUsers(query: ListQuery) {
  // Keep the last page on screen while the next one loads, instead of flashing an empty grid.
  return useApi<Page<User>>(apiKey(USERS_PATH, usersPageSchema, query), { keepPreviousData: true });
}

/** After any change to a person, every cached page of the list is stale. */
export function useRevalidateUsers(): () => Promise<unknown> {
  return useRevalidateUnder(USERS_PATH);
}
