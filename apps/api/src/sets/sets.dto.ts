import { allocateSetsSchema, proposalRequestSchema, setListQuerySchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class SetListQueryDto extends createZodDto(setListQuerySchema) {}
export class ProposalRequestDto extends createZodDto(proposalRequestSchema) {}
export class AllocateSetsDto extends createZodDto(allocateSetsSchema) {}
export class SetIdDto extends createZodDto(z.object({ id: z.uuid({ error: 'This is not a valid set id.' }) })) {}
export class PartNumberDto extends createZodDto(
  z.object({ partNumber: z.string().trim().min(1, 'Name a part number.').max(100, 'This is not a part number.') }),
) {}
