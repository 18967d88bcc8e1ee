import { masterSchema, type CreateMasterInput, type Master } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

export function createMaster(input: CreateMasterInput): Promise<Master> {
  return apiWrite('POST', '/masters', input, masterSchema);
}
