import { createGaugeStudySchema, gaugeCorrectionInputSchema, gaugeMeasurementInputSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class CreateGaugeStudyDto extends createZodDto(createGaugeStudySchema) {}
export class GaugeMeasurementDto extends createZodDto(gaugeMeasurementInputSchema) {}
export class GaugeCorrectionDto extends createZodDto(gaugeCorrectionInputSchema) {}
export class GaugeStudyIdDto extends createZodDto(
  z.object({ id: z.uuid({ error: 'This is not a valid gauge study id.' }) }),
) {}
export class GaugeMeasurementIdDto extends createZodDto(
  z.object({
    id: z.uuid({ error: 'This is not a valid gauge study id.' }),
    measurementId: z.uuid({ error: 'This is not a valid measurement id.' }),
  }),
) {}
