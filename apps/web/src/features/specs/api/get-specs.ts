import { pageOf, specSchema, type ListQuery, type Page, type Spec } from '@evenset/contracts';
import { useSWRConfig } from 'swr';
import { apiKey, useApi } from '../../../lib/swr';

export const SPECS_PATH = '/specs';
const specsPageSchema = pageOf(specSchema);

export function useSpecs(query: ListQuery) {
  return useApi<Page<Spec>>(apiKey(SPECS_PATH, specsPageSchema, query), { keepPreviousData: true });
}

/** After any change to a spec, the list, the revision pages and their comparisons are stale. */
export function useRevalidateSpecs(): () => Promise<unknown> {
  const { mutate } = useSWRConfig();
  return () =>
    mutate(
      (key) =>
        typeof key === 'object' &&
        key !== null &&
        'path' in key &&
        typeof key.path === 'string' &&
        key.path.startsWith(SPECS_PATH),
    );
}
