import { createZodValidationPipe } from 'nestjs-zod';
import { ValidationFailedException } from './errors/domain.exception';
import { zodDetails } from './errors/zod-details';

/** The one global pipe: bodies, queries and params are checked against their contract schema. */
export const ContractValidationPipe = createZodValidationPipe({
  createValidationException: (error: unknown) => new ValidationFailedException(zodDetails(error)),
});
