import { passwordResetConfirmSchema, passwordResetRequestSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';

export class PasswordResetRequestDto extends createZodDto(passwordResetRequestSchema) {}
export class PasswordResetConfirmDto extends createZodDto(passwordResetConfirmSchema) {}
