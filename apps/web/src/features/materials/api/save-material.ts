import { materialSchema, type Material, type MaterialInput } from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';

/** Adds a material, or changes the one with `materialId`. */
export function saveMaterial(materialId: string | null, input: MaterialInput): Promise<Material> {
  return materialId
    ? apiWrite('PUT', `/materials/${encodeURIComponent(materialId)}`, input, materialSchema)
    : apiWrite('POST', '/materials', input, materialSchema);
}
