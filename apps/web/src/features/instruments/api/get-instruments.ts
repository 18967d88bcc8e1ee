import { instrumentSchema, pageOf, type Instrument, type ListQuery, type Page } from '@evenset/contracts';
import { useSWRConfig } from 'swr';
import { apiKey, isApiKeyFor, useApi } from '../../../lib/swr';

const INSTRUMENTS_PATH = '/instruments';
const instrumentsPageSchema = pageOf(instrumentSchema);

export function useInstruments(query: ListQuery) {
  return useApi<Page<Instrument>>(apiKey(INSTRUMENTS_PATH, instrumentsPageSchema, query), { keepPreviousData: true });
}

export function useRevalidateInstruments(): () => Promise<unknown> {
  const { mutate } = useSWRConfig();
  return () => mutate((key) => isApiKeyFor(INSTRUMENTS_PATH, key));
}
