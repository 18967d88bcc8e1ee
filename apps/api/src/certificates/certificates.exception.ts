import { DomainException } from '../common/errors/domain.exception';

export class CertificateRefusedException extends DomainException {
  constructor(message: string) {
    super('CERTIFICATE_REFUSED', message, 409);
  }
}

export class CertificateAlreadyRevokedException extends DomainException {
  constructor(certificateNumber: string, on: string, by: string, reason: string) {
    super(
      'CERTIFICATE_ALREADY_REVOKED',
      `Certificate ${certificateNumber} was already revoked on ${on} by ${by} (“${reason}”). A certificate is revoked once.`,
      409,
    );
  }
}

export class UnknownVerificationCodeException extends DomainException {
  constructor() {
    super(
      'CERTIFICATE_NOT_FOUND',
      'No certificate has this verification code. Check the code as printed on the certificate, or ask the issuer.',
      404,
    );
  }
}
