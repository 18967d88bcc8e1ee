import { ExecutionContext, Injectable } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import { loginSchema } from '@evenset/contracts';
import type { Request } from 'express';
import { ValidationFailedException } from '../common/errors/domain.exception';
import { zodDetails } from '../common/errors/zod-details';

/**
 * Checks the form, then the credentials, and opens the session. passport ≥ 0.6 regenerates the
 * session id at `logIn`, so a session id planted before sign-in is worthless afterwards.
 */
@Injectable()
export class LoginGuard extends AuthGuard('local') {
  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request>();
    const form = loginSchema.safeParse(request.body);
    if (!form.success) throw new ValidationFailedException(zodDetails(form.error));
    const allowed = (await super.canActivate(context)) as boolean;
    await super.logIn(request);
    return allowed;
  }
}
