import { homeSchema, type Home } from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';

const HOME_KEY = apiKey('/home', homeSchema);

/** The work waiting for each of the signed-in person's roles, in one request. */
export function useHome() {
  return useApi<Home>(HOME_KEY);
}
