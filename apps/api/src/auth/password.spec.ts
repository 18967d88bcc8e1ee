import { COMMON_PASSWORD_MESSAGE, isCommonPassword } from './common-passwords';
import { hashNewPassword, hashPassword, UNKNOWN_USER_HASH, verifyPassword } from './password';

describe('password hashing (scrypt)', () => {
  it('verifies the right password and refuses a wrong one', async () => {
    const hash = await hashPassword('granite-plate-42');
    expect(hash).toMatch(/^scrypt\$32768\$8\$1\$/);
    await expect(verifyPassword('granite-plate-42', hash)).resolves.toBe(true);
    await expect(verifyPassword('granite-plate-43', hash)).resolves.toBe(false);
  });

  it('salts each hash', async () => {
    expect(await hashPassword('same')).not.toEqual(await hashPassword('same'));
  });

  it('never matches the stand-in hash used for unknown accounts, nor a malformed one', async () => {
    await expect(verifyPassword('', UNKNOWN_USER_HASH)).resolves.toBe(false);
    await expect(verifyPassword('x', 'plain-text')).resolves.toBe(false);
  });
});

describe('common passwords (@zxcvbn-ts/language-common)', () => {
  it('finds a listed password whatever its case, and not the passwords of the demo and the tests', () => {
    expect(['password123', 'PASSWORD123', 'Basketball', 'qwertyuiop'].map(isCommonPassword)).toEqual([
      true,
      true,
      true,
      true,
    ]);
    expect(['evenset-demo-1', 'correct-horse-battery', 'granite-plate-42'].map(isCommonPassword)).toEqual([
      false,
      false,
      false,
    ]);
  });

  it('refuses a common new password before hashing it, naming the field', async () => {
    await expect(hashNewPassword('Password123')).rejects.toMatchObject({
      status: 400,
      details: [{ path: 'password', message: COMMON_PASSWORD_MESSAGE }],
    });
    await expect(hashNewPassword('granite-plate-42')).resolves.toMatch(/^scrypt\$/);
  });
});
