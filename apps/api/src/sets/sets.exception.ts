import type { ApiErrorDetail } from '@evenset/contracts';
import { DomainException } from '../common/errors/domain.exception';

/** An allocation that cannot go ahead as asked; nothing was saved. */
export class AllocationRefusedException extends DomainException {
  constructor(message: string, details?: ApiErrorDetail[]) {
    super('ALLOCATION_REFUSED', `${message} Nothing was allocated.`, 409, details);
  }
}

/** Another allocation took a part between the proposal and the confirmation. */
export class PartTakenException extends DomainException {
  constructor(serials: string[]) {
    super(
      'PART_TAKEN',
      `${serials.join(', ')} ${serials.length > 1 ? 'were' : 'was'} just allocated to another set. Nothing was allocated; build the proposal again.`,
      409,
    );
  }
}
