import { listQuerySchema, materialInputSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class MaterialInputDto extends createZodDto(materialInputSchema) {}
export class MaterialListQueryDto extends createZodDto(listQuerySchema) {}
export class MaterialIdDto extends createZodDto(
  z.object({ id: z.uuid({ error: 'This is not a valid material id.' }) }),
) {}
