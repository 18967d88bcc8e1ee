import { DomainException } from '../common/errors/domain.exception';

export class UserEmailTakenException extends DomainException {
  constructor(email: string) {
    super('USER_EMAIL_TAKEN', `Someone already uses ${email}.`, 409, [
      { path: 'email', message: 'This e-mail address is already in use.' },
    ]);
  }
}

export class SelfLockoutException extends DomainException {
  constructor(what: string) {
    super('SELF_LOCKOUT', `You cannot ${what} yourself; ask another admin.`, 409);
  }
}
