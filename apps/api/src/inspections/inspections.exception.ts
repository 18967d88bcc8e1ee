import { MAX_READINGS_FILE_BYTES, MAX_READINGS_ROWS, type ApiErrorDetail, type RowError } from '@evenset/contracts';
import { DomainException } from '../common/errors/domain.exception';

export class GaugeNotUsableException extends DomainException {
  constructor(what: 'master' | 'instrument', code: string, status: string) {
    const why =
      status === 'retired'
        ? 'it is retired'
        : status === 'not-calibrated'
          ? 'it has no calibration on record'
          : 'its calibration is overdue';
    super('GAUGE_NOT_USABLE', `${code} cannot be used at the Bench: ${why}. Choose another ${what}.`, 409, [
      { path: what === 'master' ? 'masterId' : 'instrumentId', message: `${code} is not usable: ${why}.` },
    ]);
  }
}

export class RunEndedException extends DomainException {
  constructor() {
    super('RUN_ENDED', 'This run has ended with its master check; start a new run to measure more parts.', 409);
  }
}

/** A run is one inspector's set-up (their master check, their temperatures): only they record in it. */
export class RunNotYoursException extends DomainException {
  constructor(inspectorName: string) {
    super('RUN_NOT_YOURS', `This bench run belongs to ${inspectorName}; start a run of your own.`, 403);
  }
}

export class ReadingsRefusedException extends DomainException {
  constructor(details: ApiErrorDetail[]) {
    super('READINGS_REFUSED', 'Some readings need attention; nothing was saved.', 400, details);
  }
}

export class InspectionSupersedeException extends DomainException {
  constructor(message: string) {
    super('INSPECTION_SUPERSEDE_REFUSED', message, 409, [{ path: 'supersedesId', message }]);
  }
}

/** A file with row-level problems: nothing is imported; the details list each row's problem. */
export class CsvRefusedException extends DomainException {
  constructor(errors: RowError[]) {
    super(
      'CSV_REFUSED',
      `The file has ${errors.length} problem${errors.length === 1 ? '' : 's'}; nothing was imported. Preview it to see them all.`,
      400,
      errors.slice(0, 100).map((e) => ({
        path: e.column ? `row ${e.row}, ${e.column}` : `row ${e.row}`,
        message: e.message,
      })),
    );
  }
}

const MAX_MB = MAX_READINGS_FILE_BYTES / (1024 * 1024);

export class CsvTooLargeException extends DomainException {
  constructor() {
    super(
      'CSV_TOO_LARGE',
      `A readings file can be at most ${MAX_MB} MB and ${MAX_READINGS_ROWS.toLocaleString('en')} rows; split it into several uploads.`,
      413,
      [{ path: 'file', message: `The file is over ${MAX_MB} MB.` }],
    );
  }
}

/** A file whose content is not CSV text, whatever its name says (`what` it looks like instead). */
export class CsvNotTextException extends DomainException {
  constructor(name: string, what: string) {
    const message = `"${name.slice(0, 100)}" is ${what}, not a CSV file: export the readings as comma-separated text (UTF-8).`;
    super('FILE_TYPE_REFUSED', message, 400, [{ path: 'file', message }]);
  }
}

export class CsvMissingException extends DomainException {
  constructor() {
    super('FILE_MISSING', 'Attach the readings file (CSV) in the field "file".', 400, [
      { path: 'file', message: 'Attach a CSV file.' },
    ]);
  }
}
