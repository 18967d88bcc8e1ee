import { DomainException } from '../common/errors/domain.exception';

export class CustomerNameTakenException extends DomainException {
  constructor(name: string) {
    super('CUSTOMER_NAME_TAKEN', `There is already a customer named ${name}.`, 409, [
      { path: 'name', message: 'This name is already in use.' },
    ]);
  }
}

export class OrderReferenceTakenException extends DomainException {
  constructor(reference: string) {
    super('ORDER_REFERENCE_TAKEN', `This customer already has an order ${reference}.`, 409, [
      { path: 'reference', message: 'This reference is already in use for this customer.' },
    ]);
  }
}
