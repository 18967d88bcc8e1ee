import { DomainException } from '../common/errors/domain.exception';

export class LotNumberTakenException extends DomainException {
  constructor(lotNumber: string) {
    super('LOT_NUMBER_TAKEN', `There is already a lot ${lotNumber}.`, 409, [
      { path: 'lotNumber', message: 'This lot number is already in use.' },
    ]);
  }
}

export class SerialsTakenException extends DomainException {
  constructor(partNumber: string, serials: string[]) {
    super(
      'SERIALS_TAKEN',
      `${partNumber} already has serial${serials.length > 1 ? 's' : ''} ${serials.slice(0, 20).join(', ')}${serials.length > 20 ? '…' : ''}; nothing was added.`,
      409,
      [{ path: 'serials', message: 'Some serials are already in use for this part number.' }],
    );
  }
}

export class LotFullException extends DomainException {
  constructor(lotNumber: string, quantity: number, existing: number) {
    super(
      'LOT_FULL',
      `Lot ${lotNumber} is for ${quantity} parts and has ${existing}; these would make more than its quantity.`,
      409,
    );
  }
}

export class DispositionRefusedException extends DomainException {
  constructor(message: string) {
    super('DISPOSITION_REFUSED', message, 409);
  }
}
