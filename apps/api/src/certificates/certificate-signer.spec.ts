import { ConfigService } from '@nestjs/config';
import { generateKeyPairSync, verify } from 'node:crypto';
import { AppConfig } from '../config/app-config.service';
import { validateEnv } from '../config/env.schema';
import { CertificateSigner } from './certificate-signer';

const BASE = { DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db', SESSION_SECRET: 'x'.repeat(32), LOG_LEVEL: 'silent' };
const configOf = (env: Record<string, string>) => new AppConfig(new ConfigService(validateEnv({ ...BASE, ...env })));

describe('the certificate signer at start', () => {
  it('refuses to start in production without a key, saying which variable to set', () => {
    expect(() => new CertificateSigner(configOf({ NODE_ENV: 'production' }))).toThrow(
      /CERTIFICATE_SIGNING_KEY is required in production/,
    );
  });

  it('refuses a key that is not Ed25519', () => {
    const rsa = generateKeyPairSync('rsa', { modulusLength: 1024 }).privateKey.export({ format: 'pem', type: 'pkcs8' });
    expect(
      () => new CertificateSigner(configOf({ NODE_ENV: 'production', CERTIFICATE_SIGNING_KEY: String(rsa) })),
    ).toThrow(/must be an Ed25519 key, not rsa/);
  });

  it('signs with the configured key, verifiable with its public half by Node’s crypto', () => {
    const keys = generateKeyPairSync('ed25519');
    const pem = keys.privateKey.export({ format: 'pem', type: 'pkcs8' }).toString();
    const signer = new CertificateSigner(configOf({ NODE_ENV: 'production', CERTIFICATE_SIGNING_KEY: pem }));
    const { signature, keyId } = signer.sign('{"a":"1"}');
    expect(verify(null, Buffer.from('{"a":"1"}'), keys.publicKey, Buffer.from(signature, 'base64'))).toBe(true);
    expect(signer.verify('{"a":"1"}', signature, keyId)).toBe(true);
    expect(signer.verify('{"a":"2"}', signature, keyId)).toBe(false);
    expect(signer.verify('{"a":"1"}', signature, '0'.repeat(64))).toBe(false);
  });

  it('makes a key of its own outside production', () => {
    const signer = new CertificateSigner(configOf({ NODE_ENV: 'development' }));
    const { signature, keyId } = signer.sign('facts');
    expect(signer.verify('facts', signature, keyId)).toBe(true);
  });
});
