import { Injectable, Logger } from '@nestjs/common';
import type { KeyObject } from 'node:crypto';
import { AppConfig } from '../config/app-config.service';
import { generateSigningKey, loadSigningKey, signPayload, verifyPayload, type SigningKey } from './signing';

/**
 * The shop's certificate key, read once at start. Production refuses to start without one; in
 * development and tests a key is generated for the life of the process (`npm run dev` and
 * `npm start` pass one kept in .data, so certificates stay verifiable across restarts).
 */
@Injectable()
export class CertificateSigner {
  private readonly key: SigningKey;
  private readonly known: Map<string, KeyObject>;

  constructor(config: AppConfig) {
    const pem = config.get('CERTIFICATE_SIGNING_KEY');
    if (pem) {
      this.key = loadSigningKey(pem);
    } else if (config.get('NODE_ENV') === 'production') {
      throw new Error(
        'Configuration error: CERTIFICATE_SIGNING_KEY is required in production (an Ed25519 private key, PKCS#8 PEM). ' +
          'Make one with: openssl genpkey -algorithm ed25519',
      );
    } else {
      this.key = generateSigningKey();
      new Logger(CertificateSigner.name).warn(
        'No CERTIFICATE_SIGNING_KEY: certificates are signed with a key that lasts until the app stops.',
      );
    }
    this.known = new Map([[this.key.keyId, this.key.publicKey]]);
  }

  get keyId(): string {
    return this.key.keyId;
  }

  sign(payload: string): { signature: string; keyId: string } {
    return { signature: signPayload(this.key, payload), keyId: this.key.keyId };
  }

  /** True when `keyId` names a key we know and its signature over `payload` holds. */
  verify(payload: string, signature: string, keyId: string): boolean {
    const publicKey = this.known.get(keyId);
    return publicKey ? verifyPayload(publicKey, payload, signature) : false;
  }
}
