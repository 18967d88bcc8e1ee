import { specSchema, type Spec } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

/** Starts the next revision: a draft copy of this one. */
export function newSpecRevision(specId: string): Promise<Spec> {
  return apiWrite('POST', `/specs/${encodeURIComponent(specId)}/revisions`, undefined, specSchema);
}
