import { specComparisonSchema, type SpecComparison } from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';
import { SPECS_PATH } from './get-specs';

/**
 * What changed from revision `fromId` to `toId`; no request until both are chosen. A draft may have
 * changed since the last look, so every showing asks again (the answer is small).
 */
export function useSpecComparison(fromId: string | null, toId: string | null) {
  return useApi<SpecComparison>(
    fromId && toId
      ? apiKey(`${SPECS_PATH}/${encodeURIComponent(fromId)}/compare/${encodeURIComponent(toId)}`, specComparisonSchema)
      : null,
    { dedupingInterval: 0, revalidateOnMount: true },
  );
}
