import { certificateFactsSchema, type CertificateFacts } from '@evenset/contracts';
import type { Certificate } from './certificate.entity';
import type { CertificateSigner } from './certificate-signer';

export interface Integrity {
  /** The signature holds with a key we know and the facts agree with the row they are stored in. */
  intact: boolean;
  /** The stored facts, when they can be read at all. */
  facts: CertificateFacts | null;
}

function parseFacts(payload: string): CertificateFacts | null {
  try {
    const parsed = certificateFactsSchema.safeParse(JSON.parse(payload));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/**
 * Whether a stored certificate is still what was issued. A row edited behind the product's back
 * shows here: the signature no longer covers the payload, or the payload no longer names the
 * number and code in the row's own columns.
 */
export function checkIntegrity(row: Certificate, signer: CertificateSigner): Integrity {
  const facts = parseFacts(row.payload);
  const signed = signer.verify(row.payload, row.signature, row.keyId);
  const consistent =
    facts !== null &&
    facts.certificateNumber === row.certificateNumber &&
    facts.verificationCode === row.verificationCode &&
    facts.set.setNumber === row.set.setNumber;
  return { intact: signed && consistent, facts };
}
