import {
  createHash,
  createPrivateKey,
  createPublicKey,
  generateKeyPairSync,
  sign,
  verify,
  type KeyObject,
} from 'node:crypto';

/** A loaded Ed25519 signing key and the fingerprint that names its public half. */
export interface SigningKey {
  privateKey: KeyObject;
  publicKey: KeyObject;
  /** SHA-256 of the public key's DER (SubjectPublicKeyInfo), hex. */
  keyId: string;
}

export class SigningKeyException extends Error {}

/**
 * Reads a PKCS#8 PEM Ed25519 private key. Literal `\n` sequences are accepted, because a PEM put
 * on one line of an environment file arrives that way.
 */
export function loadSigningKey(pem: string): SigningKey {
  let privateKey: KeyObject;
  try {
    privateKey = createPrivateKey({ key: pem.replace(/\\n/g, '\n'), format: 'pem' });
  } catch {
    throw new SigningKeyException('CERTIFICATE_SIGNING_KEY is not a PKCS#8 PEM private key.');
  }
  if (privateKey.asymmetricKeyType !== 'ed25519')
    throw new SigningKeyException(
      `CERTIFICATE_SIGNING_KEY must be an Ed25519 key, not ${privateKey.asymmetricKeyType ?? 'unknown'}.`,
    );
  const publicKey = createPublicKey(privateKey);
  return { privateKey, publicKey, keyId: keyIdOf(publicKey) };
}

/** A fresh key, for development and tests when none is configured. */
export function generateSigningKey(): SigningKey {
  const { privateKey, publicKey } = generateKeyPairSync('ed25519');
  return { privateKey, publicKey, keyId: keyIdOf(publicKey) };
}

export function keyIdOf(publicKey: KeyObject): string {
  return createHash('sha256')
    .update(publicKey.export({ format: 'der', type: 'spki' }))
    .digest('hex');
}

/** Ed25519 signature of the UTF-8 bytes of `payload`, base64 (Ed25519 takes no separate digest). */
export function signPayload(key: SigningKey, payload: string): string {
  return sign(null, Buffer.from(payload, 'utf8'), key.privateKey).toString('base64');
}

export function verifyPayload(publicKey: KeyObject, payload: string, signature: string): boolean {
  try {
    return verify(null, Buffer.from(payload, 'utf8'), publicKey, Buffer.from(signature, 'base64'));
  } catch {
    return false;
  }
}
