import { DomainException } from '../common/errors/domain.exception';

export class MaterialNameTakenException extends DomainException {
  constructor(name: string) {
    super('MATERIAL_NAME_TAKEN', `There is already a material named ${name}.`, 409, [
      { path: 'name', message: 'This name is already in use.' },
    ]);
  }
}
