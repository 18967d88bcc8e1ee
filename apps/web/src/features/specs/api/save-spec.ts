import { specSchema, type CreateSpecInput, type Spec, type SpecDefinition } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function createSpec(input: CreateSpecInput): Promise<Spec> {
  return apiWrite('POST', '/specs', input, specSchema);
}

/** Only a draft can be changed; the server refuses a released revision. */
export function updateSpec(specId: string, definition: SpecDefinition): Promise<Spec> {
  return apiWrite('PUT', `/specs/${encodeURIComponent(specId)}`, { definition }, specSchema);
}
