import { certificateListQuerySchema, emailCertificateSchema, revokeCertificateSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class CertificateListQueryDto extends createZodDto(certificateListQuerySchema) {}
export class RevokeCertificateDto extends createZodDto(revokeCertificateSchema) {}
export class EmailCertificateDto extends createZodDto(emailCertificateSchema) {}
export class CertificateIdDto extends createZodDto(
  z.object({ id: z.uuid({ error: 'This is not a valid certificate id.' }) }),
) {}
export class SetIdDto extends createZodDto(z.object({ setId: z.uuid({ error: 'This is not a valid set id.' }) })) {}
export class VerificationCodeDto extends createZodDto(
  z.object({ code: z.string().trim().toUpperCase().min(1).max(64, 'This is not a verification code.') }),
) {}
