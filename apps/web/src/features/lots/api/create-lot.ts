import {
  lotSchema,
  partRowSchema,
  serialPreviewSchema,
  type CreateLotInput,
  type Lot,
  type PartRow,
  type SerialPattern,
  type SerialPreview,
} from '@evenset/contracts';
import { z } from 'zod';
import { apiWrite } from '../../../lib/api-client';
import { LOTS_PATH } from './get-lots';

const partsAnswerSchema = z.object({ items: z.array(partRowSchema) });

export function createLot(input: CreateLotInput): Promise<Lot> {
  return apiWrite('POST', LOTS_PATH, input, lotSchema);
}

export function previewSerials(lotId: string, pattern: SerialPattern): Promise<SerialPreview> {
  return apiWrite('POST', `${LOTS_PATH}/${encodeURIComponent(lotId)}/parts/preview`, pattern, serialPreviewSchema);
}

export function createParts(lotId: string, pattern: SerialPattern): Promise<{ items: PartRow[] }> {
  return apiWrite('POST', `${LOTS_PATH}/${encodeURIComponent(lotId)}/parts`, { pattern }, partsAnswerSchema);
}
