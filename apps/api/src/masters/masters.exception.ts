import { DomainException } from '../common/errors/domain.exception';

export class CalibrationAlreadySupersededException extends DomainException {
  constructor() {
    super(
      'CALIBRATION_ALREADY_SUPERSEDED',
      'That calibration has already been corrected; correct the latest record instead.',
      409,
      [{ path: 'supersedesId', message: 'This calibration has already been superseded.' }],
    );
  }
}
