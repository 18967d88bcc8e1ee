import { dispositionSchema, type Disposition, type DispositionInput, type ReleaseInput } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';
import { PARTS_PATH } from './get-lots';

export function disposePart(partId: string, input: DispositionInput): Promise<Disposition> {
  return apiWrite('POST', `${PARTS_PATH}/${encodeURIComponent(partId)}/dispositions`, input, dispositionSchema);
}

export function releasePart(partId: string, input: ReleaseInput): Promise<Disposition> {
  return apiWrite('POST', `${PARTS_PATH}/${encodeURIComponent(partId)}/release`, input, dispositionSchema);
}
