import { DomainException } from '../common/errors/domain.exception';

/** The search named nothing we know. */
export class NothingFoundException extends DomainException {
  constructor(q: string) {
    super(
      'NOTHING_FOUND',
      `No certificate, set or sold serial "${q}" was found. Check the number on the certificate or the serial engraved on the part.`,
      404,
    );
  }
}

/** The serial exists, but only in stock: there is no set to match. */
export class NotSoldException extends DomainException {
  constructor(serial: string, partNumbers: string[]) {
    super(
      'NOT_IN_A_SET',
      `Serial ${serial} (${partNumbers.join(', ')}) is in stock, not in a sold set. Search by the certificate number or a serial of the customer's set.`,
      404,
    );
  }
}

/** The chosen part cannot serve as asked (not released, in a set, outside or inside the window). */
export class ReplacementRefusedException extends DomainException {
  constructor(message: string, field = 'partId') {
    super('REPLACEMENT_REFUSED', message, 409, [{ path: field, message }]);
  }
}

/** Another allocation took the part between the check and the save. */
export class PartTakenException extends DomainException {
  constructor(serial: string) {
    super(
      'PART_TAKEN',
      `Part ${serial} was allocated to another set a moment ago. Search again and choose another part.`,
      409,
    );
  }
}

export class GrindRequestStepRefusedException extends DomainException {
  constructor(message: string) {
    super('GRIND_REQUEST_STEP_REFUSED', message, 409, [{ path: 'status', message }]);
  }
}
