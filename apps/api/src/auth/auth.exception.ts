import { DomainException } from '../common/errors/domain.exception';

export class InvalidCredentialsException extends DomainException {
  constructor() {
    super('AUTH_INVALID', 'Wrong e-mail or password.', 401);
  }
}
