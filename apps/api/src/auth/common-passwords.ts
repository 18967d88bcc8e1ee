import { dictionary } from '@zxcvbn-ts/language-common';
import { ValidationFailedException } from '../common/errors/domain.exception';

/**
 * The common-password list of @zxcvbn-ts/language-common (about 49,000 entries, all lower case,
 * gathered from leaked password lists). It stays on the server: in the browser bundle it would
 * weigh more than the app.
 */
const COMMON_PASSWORDS: ReadonlySet<string> = new Set(dictionary.passwords);

export const COMMON_PASSWORD_MESSAGE = 'This password is on a list of common passwords; choose another.';

export const isCommonPassword = (password: string) => COMMON_PASSWORDS.has(password.toLowerCase());

/** Refuses a new password found on the list, whatever its case, naming the field it came in. */
export function refuseCommonPassword(password: string, path = 'password'): void {
  if (isCommonPassword(password))
    throw new ValidationFailedException([{ path, message: COMMON_PASSWORD_MESSAGE }], COMMON_PASSWORD_MESSAGE);
}
