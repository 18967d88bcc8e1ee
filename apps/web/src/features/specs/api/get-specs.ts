import { pageOf, specSchema, type ListQuery, type Page, type Spec } from '@evenset/contracts';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

export const SPECS_PATH = '/specs';
const specsPageSchema = pageOf(specSchema);

export function useSpecs(query: ListQuery) {
  return useApi<Page<Spec>>(apiKey(SPECS_PATH, specsPageSchema, query), { keepPreviousData: true });
}

/** After any change to a spec, the list, the revision pages and their comparisons are stale. */
export function useRevalidateSpecs(): () => Promise<unknown> {
  return useRevalidateUnder(SPECS_PATH);
}
