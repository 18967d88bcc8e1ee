import { trendPartNumberParamsSchema, trendQuerySchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';

export class TrendQueryDto extends createZodDto(trendQuerySchema) {}
export class TrendPartNumberDto extends createZodDto(trendPartNumberParamsSchema) {}
