import { DomainException } from '../common/errors/domain.exception';

export type ResetLinkProblem = 'unknown' | 'used' | 'expired';

const MESSAGES: Record<ResetLinkProblem, string> = {
  unknown: 'This reset link is not valid. Ask for a new one from the sign-in page.',
  used: 'This reset link has already been used. Ask for a new one from the sign-in page.',
  expired: 'This reset link has expired. Ask for a new one from the sign-in page.',
};

export class ResetLinkRefusedException extends DomainException {
  constructor(problem: ResetLinkProblem) {
    super('RESET_LINK_REFUSED', MESSAGES[problem], 400, [{ path: 'token', message: MESSAGES[problem] }]);
  }
}
