import {
  interchangeSchema,
  pageOf,
  proposalSchema,
  setDetailSchema,
  setRowSchema,
  stockSchema,
  type AllocateSetsInput,
  type Interchange,
  type Page,
  type Proposal,
  type ProposalRequest,
  type SetDetail,
  type SetListQuery,
  type SetRow,
  type Stock,
} from '@evenset/contracts';
import { z } from 'zod';
import { apiWrite } from '../../../lib/api-client';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

export const SETS_PATH = '/sets';
const INTERCHANGE_PATH = '/interchange';
const setsPageSchema = pageOf(setRowSchema);
const stockListSchema = z.array(stockSchema);
const allocatedSchema = z.object({ items: z.array(setRowSchema) });

/** Who may build and allocate sets, as the API's write routes declare it. */
export const BUILD_ROLES = ['sales', 'admin'] as const;

export function useSets(query: SetListQuery) {
  return useApi<Page<SetRow>>(apiKey(SETS_PATH, setsPageSchema, query), { keepPreviousData: true });
}

export function useSet(setId: string) {
  return useApi<SetDetail>(apiKey(`${SETS_PATH}/${encodeURIComponent(setId)}`, setDetailSchema));
}

/** What each part number's free stock can make; `enabled` false for those who may not build sets. */
export function useStock(enabled = true) {
  return useApi<Stock[]>(enabled ? apiKey(`${SETS_PATH}/stock`, stockListSchema) : null);
}

/** The interchange window of a part number and the sold sets it comes from; `null` waits. */
export function useInterchange(partNumber: string | null) {
  return useApi<Interchange>(
    partNumber ? apiKey(`${INTERCHANGE_PATH}/${encodeURIComponent(partNumber)}`, interchangeSchema) : null,
  );
}

/** After an allocation: set lists, stock, windows and customers' pages are all stale. */
export function useRevalidateSets(): () => Promise<unknown> {
  return useRevalidateUnder(SETS_PATH, INTERCHANGE_PATH, '/customers', '/lots', '/parts');
}

/** Sets the system would build; saves nothing. */
export function proposeSets(request: ProposalRequest): Promise<Proposal> {
  return apiWrite('POST', `${SETS_PATH}/proposal`, request, proposalSchema);
}

/** Allocates the sets to the customer's order, all or nothing. */
export function allocateSets(input: AllocateSetsInput): Promise<{ items: SetRow[] }> {
  return apiWrite('POST', SETS_PATH, input, allocatedSchema);
}
