import { lotSchema, pageOf, type ListQuery, type Lot, type Page } from '@evenset/contracts';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

export const LOTS_PATH = '/lots';
export const PARTS_PATH = '/parts';
const lotsPageSchema = pageOf(lotSchema);

export function useLots(query: ListQuery) {
  return useApi<Page<Lot>>(apiKey(LOTS_PATH, lotsPageSchema, query), { keepPreviousData: true });
}

/** After a lot, part or inspection changes, every lot page and list is stale. */
export function useRevalidateLots(): () => Promise<unknown> {
  return useRevalidateUnder(LOTS_PATH, PARTS_PATH);
}
