import { createParamDecorator, ExecutionContext } from '@nestjs/common';
import type { SessionUser } from '@evenset/contracts';
import type { Request } from 'express';
import { NotSignedInException } from '../errors/domain.exception';

/** The signed-in person; the access guard has already refused anonymous callers. */
export const CurrentUser = createParamDecorator((_: unknown, context: ExecutionContext): SessionUser => {
  const user = context.switchToHttp().getRequest<Request>().user;
  if (!user) throw new NotSignedInException();
  return user;
});
