import { specSchema, type Spec } from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';
import { SPECS_PATH } from './get-specs';

export function useSpec(specId: string) {
  return useApi<Spec>(apiKey(`${SPECS_PATH}/${encodeURIComponent(specId)}`, specSchema));
}
