import { materialSchema, pageOf, type ListQuery, type Material, type Page } from '@evenset/contracts';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

const MATERIALS_PATH = '/materials';
const materialsPageSchema = pageOf(materialSchema);

/** The shop has a handful of materials: one page of 100 holds them all for a drop-down list. */
export const ALL_MATERIALS: ListQuery = { page: 0, pageSize: 100, sort: 'name:asc' };

export function useMaterials(query: ListQuery) {
  return useApi<Page<Material>>(apiKey(MATERIALS_PATH, materialsPageSchema, query), { keepPreviousData: true });
}

export function useRevalidateMaterials(): () => Promise<unknown> {
  return useRevalidateUnder(MATERIALS_PATH);
}
