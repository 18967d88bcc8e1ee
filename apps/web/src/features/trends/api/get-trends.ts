import {
  trendPartNumberSchema,
  trendSchema,
  type Trend,
  type TrendPartNumber,
  type TrendSubgroup,
} from '@evenset/contracts';
import { z } from 'zod';
import { apiKey, useApi } from '../../../lib/swr';

export const TRENDS_PATH = '/trends';

const partNumbersSchema = z.object({ items: z.array(trendPartNumberSchema) });

/** What the page's filters hold; empty strings and lists mean "any". */
export interface TrendFilters {
  from: string;
  to: string;
  lotIds: string[];
  inspector: string;
  masterId: string;
  subgroup: TrendSubgroup;
}

export const NO_FILTERS: TrendFilters = { from: '', to: '', lotIds: [], inspector: '', masterId: '', subgroup: 'lot' };

export function usePartNumbers() {
  return useApi<{ items: TrendPartNumber[] }>(apiKey(TRENDS_PATH, partNumbersSchema));
}

export function trendQuery(filters: TrendFilters): Record<string, string | undefined> {
  return {
    from: filters.from || undefined,
    to: filters.to || undefined,
    lotIds: filters.lotIds.length ? filters.lotIds.join(',') : undefined,
    inspector: filters.inspector || undefined,
    masterId: filters.masterId || undefined,
    subgroup: filters.subgroup,
  };
}

export function useTrend(partNumber: string | null, filters: TrendFilters) {
  return useApi<Trend>(
    partNumber ? apiKey(`${TRENDS_PATH}/${encodeURIComponent(partNumber)}`, trendSchema, trendQuery(filters)) : null,
    { keepPreviousData: true },
  );
}
