import type { ApiErrorDetail } from '@evenset/contracts';

/**
 * Base of every refusal the product makes on purpose. Each domain throws its own subclass with a
 * stable code; the global filter turns it into `{ code, message, details, requestId }`.
 */
export class DomainException extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly details?: ApiErrorDetail[],
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class ValidationFailedException extends DomainException {
  constructor(details: ApiErrorDetail[], message = 'Some fields need attention.') {
    super('VALIDATION_FAILED', message, 400, details);
  }
}

export class NotSignedInException extends DomainException {
  constructor() {
    super('NOT_SIGNED_IN', 'Sign in to continue.', 401);
  }
}

export class ForbiddenException extends DomainException {
  constructor(message = 'Your role does not allow this.') {
    super('FORBIDDEN', message, 403);
  }
}

export class CsrfInvalidException extends DomainException {
  constructor() {
    super('CSRF_INVALID', 'The page is out of date. Reload it and try again.', 403);
  }
}

export class NotFoundException extends DomainException {
  constructor(what: string) {
    super('NOT_FOUND', `${what} was not found.`, 404);
  }
}

export class DatabaseUnavailableException extends DomainException {
  constructor() {
    super('DATABASE_UNAVAILABLE', 'The database cannot be reached. Try again in a moment.', 503);
  }
}
