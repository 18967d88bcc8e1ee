export type CertificateType = 'application/pdf' | 'image/png' | 'image/jpeg';

const SIGNATURES: { type: CertificateType; bytes: number[] }[] = [
  // "%PDF-": the header every PDF file starts with (ISO 32000-1:2008, 7.5.2).
  { type: 'application/pdf', bytes: [0x25, 0x50, 0x44, 0x46, 0x2d] },
  // The 8-byte PNG signature (ISO/IEC 15948 / W3C PNG, 5.2).
  { type: 'image/png', bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  // JPEG: start-of-image marker FF D8, then the next marker's FF (ITU-T T.81, B.1.1.3).
  { type: 'image/jpeg', bytes: [0xff, 0xd8, 0xff] },
];

const BINARY_NAMES: Record<CertificateType, string> = {
  'application/pdf': 'a PDF document',
  'image/png': 'a PNG image',
  'image/jpeg': 'a JPEG image',
};

/** The file's type read from its first bytes, whatever its name says; undefined when none fits. */
export function detectCertificateType(content: Uint8Array): CertificateType | undefined {
  return SIGNATURES.find(({ bytes }) => bytes.every((byte, i) => content[i] === byte))?.type;
}

// Binary formats a gauge export is mistaken for most often, by their first bytes.
const BINARY_SIGNATURES: { what: string; bytes: number[] }[] = [
  ...SIGNATURES.map(({ type, bytes }) => ({ what: BINARY_NAMES[type], bytes })),
  // "PK\3\4": a ZIP local file header (PKWARE APPNOTE 4.3.7); .xlsx and .docx are ZIP files.
  { what: 'a ZIP archive or an Excel/Word file', bytes: [0x50, 0x4b, 0x03, 0x04] },
  // The OLE2 compound file of an old .xls/.doc ([MS-CFB] 2.2, header signature).
  { what: 'an old Excel/Word file', bytes: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1] },
  // gzip: ID1 ID2 = 1F 8B (RFC 1952, 2.3.1).
  { what: 'a gzip archive', bytes: [0x1f, 0x8b] },
  // "GIF8" (GIF89a specification, section 17).
  { what: 'a GIF image', bytes: [0x47, 0x49, 0x46, 0x38] },
];

/** How many leading bytes decide whether an upload is text. */
export const SNIFF_BYTES = 8192;

/**
 * Why the file is not plain UTF-8 text, judged from its first bytes whatever its name says
 * ("a PNG image", "binary data"), or undefined when it reads as text. Text here is UTF-8
 * (RFC 3629) without NUL or other control characters than tab, line feed, form feed and
 * carriage return; a multi-byte character cut at the sniffed length is not held against it.
 */
export function describeNonText(content: Uint8Array): string | undefined {
  const known = BINARY_SIGNATURES.find(({ bytes }) => bytes.every((byte, i) => content[i] === byte));
  if (known) return known.what;
  const head = content.subarray(0, SNIFF_BYTES);
  if (head.some((b) => b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0c && b !== 0x0d) || head.includes(0x7f))
    return 'binary data';
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(head, { stream: true });
  } catch {
    return 'not UTF-8 text';
  }
  return undefined;
}

/** The file name reduced to safe characters for a Content-Disposition header. */
export function safeFilename(name: string, fallback: string): string {
  const cleaned = name
    .replace(/[^A-Za-z0-9._-]+/g, '_')
    .replace(/^[._]+/, '')
    .slice(-100);
  return cleaned || fallback;
}
