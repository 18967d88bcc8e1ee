import { type ArgumentMetadata, Injectable } from '@nestjs/common';
import { createZodValidationPipe, ZodValidationException } from 'nestjs-zod';
import { ValidationFailedException } from './errors/domain.exception';
import { zodDetails } from './errors/zod-details';

/**
 * The one global pipe: bodies, queries and params are checked against their contract schema. A
 * refusal of the input as a whole (a body that is an array, or missing) names it: `body`, `query`.
 */
@Injectable()
export class ContractValidationPipe extends createZodValidationPipe() {
  override transform(value: unknown, metadata: ArgumentMetadata): unknown {
    try {
      return super.transform(value, metadata) as unknown;
    } catch (error) {
      if (!(error instanceof ZodValidationException)) throw error;
      throw new ValidationFailedException(zodDetails(error.getZodError(), metadata.type));
    }
  }
}
