import { validateEnv } from './env.schema';

describe('validateEnv', () => {
  const base = { DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db' };

  it('fills the defaults: loopback, port 3000', () => {
    expect(validateEnv(base)).toMatchObject({ HOST: '127.0.0.1', PORT: 3000, NODE_ENV: 'development' });
  });

  it('names every bad variable', () => {
    expect(() => validateEnv({ PORT: 'eighty', LOG_LEVEL: 'loud' })).toThrow(
      /DATABASE_URL[\s\S]*PORT|PORT[\s\S]*DATABASE_URL/,
    );
    expect(() => validateEnv({ ...base, LOG_LEVEL: 'loud' })).toThrow(/LOG_LEVEL/);
  });

  it('requires a session secret in production', () => {
    expect(() => validateEnv({ ...base, NODE_ENV: 'production' })).toThrow(/SESSION_SECRET is required in production/);
    expect(() => validateEnv({ ...base, SESSION_SECRET: 'short' })).toThrow(/SESSION_SECRET/);
  });
});
