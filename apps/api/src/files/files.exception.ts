import { MAX_CERTIFICATE_BYTES } from '@evenset/contracts';
import { DomainException } from '../common/errors/domain.exception';

const MB = MAX_CERTIFICATE_BYTES / (1024 * 1024);

export class FileMissingException extends DomainException {
  constructor(field: string) {
    super('FILE_MISSING', 'Attach the certificate file.', 400, [
      { path: field, message: 'Attach the certificate as a PDF, PNG or JPEG file.' },
    ]);
  }
}

export class FileTypeRefusedException extends DomainException {
  constructor(field: string) {
    super('FILE_TYPE_REFUSED', 'The certificate must be a PDF, PNG or JPEG file.', 400, [
      { path: field, message: 'This file is not a PDF, PNG or JPEG (judged by its content, not its name).' },
    ]);
  }
}

export class FileTooLargeException extends DomainException {
  constructor(field: string) {
    super('FILE_TOO_LARGE', `The certificate file can be at most ${MB} MB.`, 413, [
      { path: field, message: `Use a file of at most ${MB} MB.` },
    ]);
  }
}

export class UploadUnreadableException extends DomainException {
  constructor(field: string) {
    super('UPLOAD_UNREADABLE', 'The upload could not be read.', 400, [
      { path: field, message: `Send one file as a multipart form, in the field "${field}".` },
    ]);
  }
}
