import { masterSchema, type Master, type RetireInput } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function retireMaster(masterId: string, input: RetireInput): Promise<Master> {
  return apiWrite('POST', `/masters/${encodeURIComponent(masterId)}/retire`, input, masterSchema);
}
