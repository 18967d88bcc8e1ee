import { masterDetailSchema, type MasterDetail } from '@evenset/contracts';
import { apiKey, useApi } from '../../../lib/swr';
import { MASTERS_PATH } from './get-masters';

export function useMaster(masterId: string) {
  return useApi<MasterDetail>(apiKey(`${MASTERS_PATH}/${encodeURIComponent(masterId)}`, masterDetailSchema));
}

/** Where the browser downloads a calibration's certificate file (the session cookie goes along). */
export function certificateHref(masterId: string, calibrationId: string): string {
  return `/api${MASTERS_PATH}/${encodeURIComponent(masterId)}/calibrations/${encodeURIComponent(calibrationId)}/certificate`;
}
