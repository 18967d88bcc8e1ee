import { instrumentSchema, pageOf, type Instrument, type ListQuery, type Page } from '@evenset/contracts';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

const INSTRUMENTS_PATH = '/instruments';
const instrumentsPageSchema = pageOf(instrumentSchema);

export function useInstruments(query: ListQuery) {
  return useApi<Page<Instrument>>(apiKey(INSTRUMENTS_PATH, instrumentsPageSchema, query), { keepPreviousData: true });
}

export function useRevalidateInstruments(): () => Promise<unknown> {
  return useRevalidateUnder(INSTRUMENTS_PATH);
}
