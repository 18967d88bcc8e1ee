import { calibrationRecordedSchema, type CalibrationForm, type CalibrationRecorded } from '@evenset/contracts';
import { apiUpload } from '../../../lib/api-client';

/**
 * Sends a calibration's fields and its certificate file in one multipart request. A correction is
 * answered with its impact: the parts whose verdict changed when their heights were recomputed.
 */
export function addCalibration(
  masterId: string,
  input: CalibrationForm,
  certificate: File,
  onProgress: (share: number) => void,
): Promise<CalibrationRecorded> {
  const form = new FormData();
  for (const [name, value] of Object.entries(input)) {
    if (value !== undefined) form.set(name, String(value));
  }
  form.set('certificate', certificate, certificate.name);
  return apiUpload(
    `/masters/${encodeURIComponent(masterId)}/calibrations`,
    form,
    calibrationRecordedSchema,
    onProgress,
  );
}
