import { createSpecSchema, specListQuerySchema, updateSpecSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

const specId = z.uuid({ error: 'This is not a valid spec id.' });

export class CreateSpecDto extends createZodDto(createSpecSchema) {}
export class UpdateSpecDto extends createZodDto(updateSpecSchema) {}
export class SpecListQueryDto extends createZodDto(specListQuerySchema) {}
export class SpecIdDto extends createZodDto(z.object({ id: specId })) {}
export class SpecPairDto extends createZodDto(z.object({ id: specId, otherId: specId })) {}
