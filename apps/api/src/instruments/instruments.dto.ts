import { gaugeListQuerySchema, instrumentInputSchema, retireSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class InstrumentInputDto extends createZodDto(instrumentInputSchema) {}
export class InstrumentListQueryDto extends createZodDto(gaugeListQuerySchema) {}
export class RetireInstrumentDto extends createZodDto(retireSchema) {}
export class InstrumentIdDto extends createZodDto(
  z.object({ id: z.uuid({ error: 'This is not a valid instrument id.' }) }),
) {}
