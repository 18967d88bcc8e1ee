import {
  createLotSchema,
  createPartsSchema,
  dispositionInputSchema,
  lotListQuerySchema,
  partListQuerySchema,
  releaseInputSchema,
  serialPatternSchema,
} from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class CreateLotDto extends createZodDto(createLotSchema) {}
export class LotListQueryDto extends createZodDto(lotListQuerySchema) {}
export class PartListQueryDto extends createZodDto(partListQuerySchema) {}
export class SerialPatternDto extends createZodDto(serialPatternSchema) {}
export class CreatePartsDto extends createZodDto(createPartsSchema) {}
export class DispositionDto extends createZodDto(dispositionInputSchema) {}
export class ReleaseDto extends createZodDto(releaseInputSchema) {}
export class LotIdDto extends createZodDto(z.object({ id: z.uuid({ error: 'This is not a valid lot id.' }) })) {}
export class PartIdDto extends createZodDto(z.object({ id: z.uuid({ error: 'This is not a valid part id.' }) })) {}
