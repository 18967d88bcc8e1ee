import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@evenset/contracts';
import type { Request } from 'express';
import { ForbiddenException, NotSignedInException } from '../errors/domain.exception';
import { PUBLIC_KEY, ROLES_KEY } from './access.decorators';

/** Deny by default: a route is open only to the roles it names, or to all when marked public. */
@Injectable()
export class AccessGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(PUBLIC_KEY, targets)) return true;
    const request = context.switchToHttp().getRequest<Request>();
    const user = request.user;
    if (!user) throw new NotSignedInException();
    const allowed = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (!allowed || !user.roles.some((role) => allowed.includes(role))) throw new ForbiddenException();
    return true;
  }
}
