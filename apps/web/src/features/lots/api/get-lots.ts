import { lotSchema, pageOf, type ListQuery, type Lot, type Page } from '@evenset/contracts';
import { useSWRConfig } from 'swr';
import { apiKey, useApi } from '../../../lib/swr';

export const LOTS_PATH = '/lots';
export const PARTS_PATH = '/parts';
const lotsPageSchema = pageOf(lotSchema);

export function useLots(query: ListQuery) {
  return useApi<Page<Lot>>(apiKey(LOTS_PATH, lotsPageSchema, query), { keepPreviousData: true });
}

/** After a lot, part or inspection changes, every lot page and list is stale. */
export function useRevalidateLots(): () => Promise<unknown> {
  const { mutate } = useSWRConfig();
  return () =>
    mutate(
      (key) =>
        typeof key === 'object' &&
        key !== null &&
        'path' in key &&
        typeof key.path === 'string' &&
        (key.path.startsWith(LOTS_PATH) || key.path.startsWith(PARTS_PATH)),
    );
}
