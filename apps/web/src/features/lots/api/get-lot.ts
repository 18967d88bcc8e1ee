import {
  lotDetailSchema,
  pageOf,
  partRowSchema,
  type LotDetail,
  type Page,
  type PartListQuery,
  type PartRow,
} from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';
import { LOTS_PATH } from './get-lots';

const partsPageSchema = pageOf(partRowSchema);

export function useLot(lotId: string | null) {
  return useApi<LotDetail>(lotId ? apiKey(`${LOTS_PATH}/${encodeURIComponent(lotId)}`, lotDetailSchema) : null);
}

export function useLotParts(lotId: string | null, query: PartListQuery) {
  return useApi<Page<PartRow>>(
    lotId ? apiKey(`${LOTS_PATH}/${encodeURIComponent(lotId)}/parts`, partsPageSchema, query) : null,
    { keepPreviousData: true },
  );
}
