import { generateKeyPairSync, randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DATA_DIR } from './paths.mjs';

/** A random secret kept in .data (ignored by git), so local sessions survive a restart. */
export function localSecret(name) {
  const file = join(DATA_DIR, `${name}.secret`);
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(DATA_DIR, { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}

/**
 * The Ed25519 key (PKCS#8 PEM) that signs certificates, made once and kept in .data, so
 * certificates issued before a restart still verify after it.
 */
export function localSigningKey() {
  const file = join(DATA_DIR, 'certificate-signing-key.pem');
  if (existsSync(file)) return readFileSync(file, 'utf8');
  mkdirSync(DATA_DIR, { recursive: true });
  const pem = generateKeyPairSync('ed25519').privateKey.export({ format: 'pem', type: 'pkcs8' }).toString();
  writeFileSync(file, pem, { mode: 0o600 });
  return pem;
}
