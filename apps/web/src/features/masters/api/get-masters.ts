import { masterSchema, pageOf, type ListQuery, type Master, type Page } from '@evenset/contracts';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

export const MASTERS_PATH = '/masters';
const mastersPageSchema = pageOf(masterSchema);

export function useMasters(query: ListQuery) {
  return useApi<Page<Master>>(apiKey(MASTERS_PATH, mastersPageSchema, query), { keepPreviousData: true });
}

/** After any change to a master, its page and every page of the list are stale. */
export function useRevalidateMasters(): () => Promise<unknown> {
  return useRevalidateUnder(MASTERS_PATH);
}
