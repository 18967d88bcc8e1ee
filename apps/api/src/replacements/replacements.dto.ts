import {
  allocateReplacementSchema,
  createGrindRequestSchema,
  grindRequestListQuerySchema,
  grindRequestStepSchema,
  replacementLookupQuerySchema,
} from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class ReplacementLookupQueryDto extends createZodDto(replacementLookupQuerySchema) {}
export class AllocateReplacementDto extends createZodDto(allocateReplacementSchema) {}
export class CreateGrindRequestDto extends createZodDto(createGrindRequestSchema) {}
export class GrindRequestStepDto extends createZodDto(grindRequestStepSchema) {}
export class GrindRequestListQueryDto extends createZodDto(grindRequestListQuerySchema) {}
export class GrindRequestIdDto extends createZodDto(
  z.object({ id: z.uuid({ error: 'This is not a valid grind request id.' }) }),
) {}
