import { outboxListQuerySchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

const id = z.uuid({ error: 'This is not a valid message id.' });

export class OutboxListQueryDto extends createZodDto(outboxListQuerySchema) {}
export class MessageIdDto extends createZodDto(z.object({ id })) {}
export class AttachmentIndexDto extends createZodDto(
  z.object({
    id,
    index: z.coerce
      .number({ error: 'The attachment number must be a whole number.' })
      .int('The attachment number must be a whole number.')
      .min(0, 'The attachment number cannot be negative.'),
  }),
) {}
