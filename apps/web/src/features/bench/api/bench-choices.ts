import {
  instrumentSchema,
  masterDetailSchema,
  masterSchema,
  pageOf,
  type Instrument,
  type Master,
  type MasterDetail,
  type Page,
} from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';

const USABLE = { page: 0, pageSize: 100, usable: 'true', sort: 'code:asc' } as const;
const mastersPage = pageOf(masterSchema);
const instrumentsPage = pageOf(instrumentSchema);

/** Master gauges that may be used at the Bench (the API leaves out overdue and retired ones). */
export function useUsableMasters() {
  return useApi<Page<Master>>(apiKey('/masters', mastersPage, USABLE));
}

export function useUsableInstruments() {
  return useApi<Page<Instrument>>(apiKey('/instruments', instrumentsPage, USABLE));
}

export function useMasterDetail(masterId: string | null) {
  return useApi<MasterDetail>(masterId ? apiKey(`/masters/${encodeURIComponent(masterId)}`, masterDetailSchema) : null);
}
