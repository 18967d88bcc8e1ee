import { MAX_CERTIFICATE_BYTES } from '@evenset/contracts';
import { FileTooLargeException } from './files.exception';
import { singleFileInterceptor, type UploadedFileContent } from './single-file.interceptor';

/** The multipart field that carries a certificate file. */
export const CERTIFICATE_FIELD = 'certificate';

/** A certificate file, kept in memory: it is stored in the database. */
export type UploadedCertificate = UploadedFileContent;

/** Reads one certificate file; a file over the limit is refused with a message naming the limit. */
export const CertificateUploadInterceptor = singleFileInterceptor(
  CERTIFICATE_FIELD,
  MAX_CERTIFICATE_BYTES,
  () => new FileTooLargeException(CERTIFICATE_FIELD),
);
