import { hashPassword, UNKNOWN_USER_HASH, verifyPassword } from './password';

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
