export type CertificateType = 'application/pdf' | 'image/png' | 'image/jpeg';

const SIGNATURES: { type: CertificateType; bytes: number[] }[] = [
  // "%PDF-": the header every PDF file starts with (ISO 32000-1:2008, 7.5.2).
  { type: 'application/pdf', bytes: [0x25, 0x50, 0x44, 0x46, 0x2d] },
  // The 8-byte PNG signature (ISO/IEC 15948 / W3C PNG, 5.2).
  { type: 'image/png', bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  // JPEG: start-of-image marker FF D8, then the next marker's FF (ITU-T T.81, B.1.1.3).
  { type: 'image/jpeg', bytes: [0xff, 0xd8, 0xff] },
];

/** The file's type read from its first bytes, whatever its name says; undefined when none fits. */
export function detectCertificateType(content: Uint8Array): CertificateType | undefined {
  return SIGNATURES.find(({ bytes }) => bytes.every((byte, i) => content[i] === byte))?.type;
}

/** The file name reduced to safe characters for a Content-Disposition header. */
export function safeFilename(name: string, fallback: string): string {
  const cleaned = name
    .replace(/[^A-Za-z0-9._-]+/g, '_')
    .replace(/^[._]+/, '')
    .slice(-100);
  return cleaned || fallback;
}
