import {
  BadRequestException,
  CallHandler,
  ExecutionContext,
  mixin,
  NestInterceptor,
  PayloadTooLargeException,
  type Type,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { UploadUnreadableException } from './files.exception';

/** What multer hands over for one uploaded file (kept in memory). */
export interface UploadedFileContent {
  originalname: string;
  size: number;
  buffer: Buffer;
}

/**
 * An interceptor reading one file from multipart field `field` into memory; a file over
 * `maxBytes` is refused with the domain error `tooLarge()` makes, naming the limit.
 */
export function singleFileInterceptor(field: string, maxBytes: number, tooLarge: () => Error): Type<NestInterceptor> {
  const Multipart = FileInterceptor(field, { limits: { fileSize: maxBytes, files: 1, fields: 20 } });
  class SingleFileInterceptor extends Multipart implements NestInterceptor {
    override async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      try {
        return await super.intercept(context, next);
      } catch (error) {
        if (error instanceof PayloadTooLargeException) throw tooLarge();
        // Multer's refusals (a file under another name, two files, a broken form) name no field.
        if (error instanceof BadRequestException) throw new UploadUnreadableException(field);
        throw error;
      }
    }
  }
  return mixin(SingleFileInterceptor);
}
