import { auditListQuerySchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';

export class AuditListQueryDto extends createZodDto(auditListQuerySchema) {}
