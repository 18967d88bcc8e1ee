import { DomainException } from '../common/errors/domain.exception';

export class SlotAlreadyMeasuredException extends DomainException {
  constructor(serial: string) {
    super(
      'SLOT_ALREADY_MEASURED',
      `${serial} has already been measured at this place in your order; carry on with the next part.`,
      409,
    );
  }
}

export class SlotOutOfOrderException extends DomainException {
  constructor() {
    super(
      'SLOT_OUT_OF_ORDER',
      'Measure the parts in the order the Bench gives them. Reload to see your next part.',
      409,
    );
  }
}

export class GaugeCorrectionRefusedException extends DomainException {
  constructor(message: string) {
    super('GAUGE_CORRECTION_REFUSED', message, 409);
  }
}
