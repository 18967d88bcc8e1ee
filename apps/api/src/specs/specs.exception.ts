import { DomainException } from '../common/errors/domain.exception';

export class SpecPartNumberTakenException extends DomainException {
  constructor(partNumber: string) {
    super(
      'SPEC_PART_NUMBER_TAKEN',
      `Part number ${partNumber} already has a spec; make a new revision of it instead.`,
      409,
      [{ path: 'partNumber', message: 'This part number already has a spec.' }],
    );
  }
}

export class SpecFrozenException extends DomainException {
  constructor(partNumber: string, revision: string) {
    super(
      'SPEC_FROZEN',
      `${partNumber} rev ${revision} is released and cannot change; make a new revision instead.`,
      409,
    );
  }
}

export class SpecNotDraftException extends DomainException {
  constructor(partNumber: string, revision: string) {
    super('SPEC_NOT_DRAFT', `${partNumber} rev ${revision} is not a draft, so it cannot be released.`, 409);
  }
}

export class SpecRevisionRefusedException extends DomainException {
  constructor(message: string) {
    super('SPEC_REVISION_REFUSED', message, 409);
  }
}
