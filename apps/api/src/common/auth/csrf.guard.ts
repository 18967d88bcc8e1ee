import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import type { Request } from 'express';
import { CsrfInvalidException } from '../errors/domain.exception';
import { csrf } from './csrf';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Runs after the access guard, so an anonymous caller learns 401 before anything else. */
@Injectable()
export class CsrfGuard implements CanActivate {
  canActivate(context: ExecutionContext): boolean {
    const request = context.switchToHttp().getRequest<Request>();
    if (SAFE_METHODS.has(request.method)) return true;
    if (!csrf.isRequestValid(request)) throw new CsrfInvalidException();
    return true;
  }
}
