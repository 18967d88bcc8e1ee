import { DomainException } from '../errors/domain.exception';

/** Master gauges and instruments share these refusals. */
export class GaugeCodeTakenException extends DomainException {
  constructor(code: string) {
    super('GAUGE_CODE_TAKEN', `There is already a gauge with id code ${code}.`, 409, [
      { path: 'code', message: 'This id code is already in use.' },
    ]);
  }
}

export class GaugeRetiredException extends DomainException {
  constructor(code: string) {
    super('GAUGE_RETIRED', `${code} is retired.`, 409);
  }
}
