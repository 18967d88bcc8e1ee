import { partDetailSchema, type PartDetail } from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';
import { PARTS_PATH } from './get-lots';

export function usePart(partId: string) {
  return useApi<PartDetail>(apiKey(`${PARTS_PATH}/${encodeURIComponent(partId)}`, partDetailSchema));
}
