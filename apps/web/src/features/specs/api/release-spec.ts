import { specSchema, type Spec } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function releaseSpec(specId: string): Promise<Spec> {
  return apiWrite('POST', `/specs/${encodeURIComponent(specId)}/release`, undefined, specSchema);
}
