import { calibrationFormSchema, createMasterSchema, gaugeListQuerySchema, retireSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

const masterId = z.uuid({ error: 'This is not a valid master id.' });

export class CreateMasterDto extends createZodDto(createMasterSchema) {}
export class CalibrationFormDto extends createZodDto(calibrationFormSchema) {}
export class RetireDto extends createZodDto(retireSchema) {}
export class GaugeListQueryDto extends createZodDto(gaugeListQuerySchema) {}
export class MasterIdDto extends createZodDto(z.object({ id: masterId })) {}
export class CalibrationIdDto extends createZodDto(
  z.object({ id: masterId, calibrationId: z.uuid({ error: 'This is not a valid calibration id.' }) }),
) {}
