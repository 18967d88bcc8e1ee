import { ArgumentsHost, Catch, ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import type { ApiErrorBody } from '@evenset/contracts';
import type { Request, Response } from 'express';
import { ThrottlerException } from '@nestjs/throttler';
import { ZodValidationException } from 'nestjs-zod';
import { DatabaseUnavailableException, DomainException } from './domain.exception';
import { isDatabaseUnavailable } from './database-errors';
import { zodDetails } from './zod-details';

/** Turns every error into the one answer shape; unexpected ones are logged once and answered bare. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request>();
    const response = http.getResponse<Response>();
    const requestId = typeof request.id === 'string' ? request.id : String(request.id ?? '');
    const { status, body } = this.toAnswer(exception, requestId);
    if (status >= 500 && !(exception instanceof DomainException)) {
      this.logger.error({ err: exception, requestId }, 'Unexpected error');
    }
    if (response.headersSent) return;
    response.status(status).json(body);
  }

  private toAnswer(exception: unknown, requestId: string): { status: number; body: ApiErrorBody } {
    if (exception instanceof ZodValidationException) {
      const details = zodDetails(exception.getZodError());
      return {
        status: 400,
        body: {
          code: 'VALIDATION_FAILED',
          message: 'Some fields need attention.',
          details,
          requestId,
        },
      };
    }
    if (isDatabaseUnavailable(exception)) exception = new DatabaseUnavailableException();
    if (exception instanceof DomainException) {
      const body: ApiErrorBody = {
        code: exception.code,
        message: exception.message,
        requestId,
      };
      if (exception.details) body.details = exception.details;
      return { status: exception.status, body };
    }
    if (exception instanceof ThrottlerException) {
      return {
        status: 429,
        body: {
          code: 'TOO_MANY_ATTEMPTS',
          message: 'Too many attempts. Wait a minute, then try again.',
          requestId,
        },
      };
    }
    exception = unreadableRequest(exception) ?? exception;
    if (exception instanceof HttpException) {
      return {
        status: exception.getStatus(),
        body: {
          code: httpCode(exception.getStatus()),
          message: plainMessage(exception),
          requestId,
        },
      };
    }
    return {
      status: 500,
      body: {
        code: 'INTERNAL',
        message: 'Something went wrong on our side.',
        requestId,
      },
    };
  }
}

/**
 * body-parser refuses a request it cannot read (over the size limit, an unknown charset or content
 * encoding, broken gzip) with an http-errors error: a 4xx `status` and `expose: true` (body-parser
 * README, "Errors"). Nest maps only its SyntaxError, so the others would otherwise answer 500.
 */
function unreadableRequest(exception: unknown): HttpException | undefined {
  if (!(exception instanceof Error) || exception instanceof HttpException) return undefined;
  const { status, expose } = exception as { status?: unknown; expose?: unknown };
  if (typeof status !== 'number' || status < 400 || status > 499 || expose !== true) return undefined;
  return new HttpException(exception.message, status);
}

function httpCode(status: number): string {
  if (status === 404) return 'NOT_FOUND';
  if (status === 413) return 'TOO_LARGE';
  if (status === 415) return 'UNSUPPORTED_MEDIA_TYPE';
  if (status === 400) return 'BAD_REQUEST';
  return `HTTP_${status}`;
}

function plainMessage(exception: HttpException): string {
  if (exception.getStatus() === 404) return 'There is nothing at this address.';
  if (exception.getStatus() === 413) return 'The request is too large.';
  if (exception.getStatus() === 415) return 'Send the body as JSON in UTF-8.';
  if (exception.getStatus() === 400) return 'The request could not be read. Check that it is valid JSON.';
  return exception.message;
}
