import { createInspectionSchema, createRunSchema, endRunSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class CreateRunDto extends createZodDto(createRunSchema) {}
export class EndRunDto extends createZodDto(endRunSchema) {}
export class CreateInspectionDto extends createZodDto(createInspectionSchema) {}
export class RunIdDto extends createZodDto(z.object({ id: z.uuid({ error: 'This is not a valid run id.' }) })) {}
