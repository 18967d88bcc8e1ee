import { CallHandler, ExecutionContext, Injectable, NestInterceptor, PayloadTooLargeException } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { MAX_CERTIFICATE_BYTES } from '@evenset/contracts';
import type { Observable } from 'rxjs';
import { FileTooLargeException } from './files.exception';

/** The multipart field that carries a certificate file. */
export const CERTIFICATE_FIELD = 'certificate';

/** What multer hands over for one uploaded file (kept in memory; it is stored in the database). */
export interface UploadedCertificate {
  originalname: string;
  size: number;
  buffer: Buffer;
}

const Multipart = FileInterceptor(CERTIFICATE_FIELD, {
  limits: { fileSize: MAX_CERTIFICATE_BYTES, files: 1, fields: 20 },
});

/** Reads one certificate file; a file over the limit is refused with a message naming the limit. */
@Injectable()
export class CertificateUploadInterceptor extends Multipart implements NestInterceptor {
  override async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await super.intercept(context, next);
    } catch (error) {
      if (error instanceof PayloadTooLargeException) throw new FileTooLargeException(CERTIFICATE_FIELD);
      throw error;
    }
  }
}
