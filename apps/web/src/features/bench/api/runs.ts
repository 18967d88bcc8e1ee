import {
  inspectionSchema,
  readingsImportSchema,
  readingsPreviewSchema,
  runSchema,
  type CreateInspectionInput,
  type CreateRunInput,
  type EndRunInput,
  type Inspection,
  type ReadingsImport,
  type ReadingsPreview,
  type Run,
} from '@evenset/contracts';
import { apiUpload, apiWrite } from '../../../lib/api-client';

const run = (runId: string) => `/runs/${encodeURIComponent(runId)}`;

export function startRun(input: CreateRunInput): Promise<Run> {
  return apiWrite('POST', '/runs', input, runSchema);
}

export function endRun(runId: string, input: EndRunInput): Promise<Run> {
  return apiWrite('POST', `${run(runId)}/end`, input, runSchema);
}

export function saveInspection(runId: string, input: CreateInspectionInput): Promise<Inspection> {
  return apiWrite('POST', `${run(runId)}/inspections`, input, inspectionSchema);
}

function fileForm(file: File): FormData {
  const form = new FormData();
  form.set('file', file, file.name);
  return form;
}

/** What a CSV would save, row by row, before anything is saved. */
export function previewReadings(
  runId: string,
  file: File,
  onProgress: (share: number) => void,
): Promise<ReadingsPreview> {
  return apiUpload(`${run(runId)}/readings/preview`, fileForm(file), readingsPreviewSchema, onProgress);
}

/** Saves every part of a CSV, or nothing when any row is wrong. */
export function importReadings(
  runId: string,
  file: File,
  onProgress: (share: number) => void,
): Promise<ReadingsImport> {
  return apiUpload(`${run(runId)}/readings/import`, fileForm(file), readingsImportSchema, onProgress);
}
