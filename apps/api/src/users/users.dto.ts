import { changeRolesSchema, createUserSchema, listQuerySchema, resetPasswordSchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class CreateUserDto extends createZodDto(createUserSchema) {}
export class ChangeRolesDto extends createZodDto(changeRolesSchema) {}
export class ResetPasswordDto extends createZodDto(resetPasswordSchema) {}
export class UserListQueryDto extends createZodDto(listQuerySchema) {}
export class UserIdDto extends createZodDto(z.object({ id: z.uuid({ error: 'This is not a valid person id.' }) })) {}
