import {
  allocatedReplacementSchema,
  grindRequestDetailSchema,
  grindRequestRowSchema,
  pageOf,
  replacementLookupSchema,
  type AllocateReplacementInput,
  type AllocatedReplacement,
  type CreateGrindRequestInput,
  type GrindRequestDetail,
  type GrindRequestListQuery,
  type GrindRequestRow,
  type GrindRequestStepInput,
  type Page,
  type ReplacementLookup,
} from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

export const REPLACEMENTS_PATH = '/replacements';
export const GRIND_REQUESTS_PATH = '/grind-requests';
const grindRequestsPageSchema = pageOf(grindRequestRowSchema);

/** The replacement check for a certificate number or serial; nothing is asked before one is typed. */
export function useReplacementLookup(q: string) {
  return useApi<ReplacementLookup>(q ? apiKey(`${REPLACEMENTS_PATH}/lookup`, replacementLookupSchema, { q }) : null, {
    revalidateOnFocus: false,
  });
}

export function allocateReplacement(input: AllocateReplacementInput): Promise<AllocatedReplacement> {
  return apiWrite('POST', REPLACEMENTS_PATH, input, allocatedReplacementSchema);
}

export function useGrindRequests(query: GrindRequestListQuery) {
  return useApi<Page<GrindRequestRow>>(apiKey(GRIND_REQUESTS_PATH, grindRequestsPageSchema, query), {
    keepPreviousData: true,
  });
}

export function useGrindRequest(id: string) {
  return useApi<GrindRequestDetail>(
    apiKey(`${GRIND_REQUESTS_PATH}/${encodeURIComponent(id)}`, grindRequestDetailSchema),
  );
}

export function createGrindRequest(input: CreateGrindRequestInput): Promise<GrindRequestDetail> {
  return apiWrite('POST', GRIND_REQUESTS_PATH, input, grindRequestDetailSchema);
}

export function recordGrindStep(id: string, input: GrindRequestStepInput): Promise<GrindRequestDetail> {
  return apiWrite('POST', `${GRIND_REQUESTS_PATH}/${encodeURIComponent(id)}/steps`, input, grindRequestDetailSchema);
}

/** After an allocation or a grind request, the check, the requests, sets and parts are stale. */
export function useRevalidateReplacements(): () => Promise<unknown> {
  return useRevalidateUnder(REPLACEMENTS_PATH, GRIND_REQUESTS_PATH, '/sets', '/lots', '/parts');
}
