import { describeNonText, detectCertificateType, safeFilename, SNIFF_BYTES } from './file-type';

describe('detectCertificateType', () => {
  it('reads PDF, PNG and JPEG from their signatures', () => {
    // ISO 32000-1 7.5.2: a PDF starts "%PDF-1.n".
    expect(detectCertificateType(Buffer.from('%PDF-1.7\n%âãÏÓ\n'))).toBe('application/pdf');
    // W3C PNG 5.2: 137 80 78 71 13 10 26 10.
    expect(detectCertificateType(Buffer.from([137, 80, 78, 71, 13, 10, 26, 10, 0, 0, 0, 13]))).toBe('image/png');
    // ITU-T T.81: SOI (FF D8) followed by a marker, here APP0 (FF E0).
    expect(detectCertificateType(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16]))).toBe('image/jpeg');
  });

  it('refuses anything else, however it is named', () => {
    expect(detectCertificateType(Buffer.from('GIF89a'))).toBeUndefined();
    expect(detectCertificateType(Buffer.from('PK\u0003\u0004'))).toBeUndefined(); // a zip or .docx
    expect(detectCertificateType(Buffer.from(' %PDF-1.7'))).toBeUndefined();
    expect(detectCertificateType(Buffer.alloc(0))).toBeUndefined();
  });
});

describe('safeFilename', () => {
  it('keeps plain names and strips anything that could break a header or a path', () => {
    expect(safeFilename('cert-2026.pdf', 'x')).toBe('cert-2026.pdf');
    expect(safeFilename('../"evil"\r\n.pdf', 'x')).toBe('evil_.pdf');
    expect(safeFilename('', 'certificate.pdf')).toBe('certificate.pdf');
  });
});

describe('describeNonText', () => {
  it('reads CSV text as text: UTF-8 with or without a byte-order mark, CRLF, tabs, a character cut at the end', () => {
    expect(describeNonText(Buffer.from('serial,station,reading,unit\r\nK-1,P1,0.1,in\r\n'))).toBeUndefined();
    expect(describeNonText(Buffer.from('\uFEFFserial,station\tµm\n'))).toBeUndefined();
    expect(describeNonText(Buffer.alloc(0))).toBeUndefined();
    // "µ" is C2 B5 in UTF-8 (RFC 3629); cut after C2 by the sniffed length it is still text.
    const cut = Buffer.concat([Buffer.alloc(SNIFF_BYTES - 1, 'a'), Buffer.from('µ')]);
    expect(describeNonText(cut)).toBeUndefined();
  });

  it('names the binary formats an export is mistaken for, whatever the file is called', () => {
    expect(describeNonText(Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]))).toBe('a PNG image');
    expect(describeNonText(Buffer.from('%PDF-1.7\n'))).toBe('a PDF document');
    expect(describeNonText(Buffer.from('PK\u0003\u0004\u0014\u0000'))).toBe('a ZIP archive or an Excel/Word file');
    expect(describeNonText(Buffer.from([0x1f, 0x8b, 8, 0]))).toBe('a gzip archive');
  });

  it('refuses NUL and control bytes, and bytes that are not UTF-8', () => {
    expect(describeNonText(Buffer.from('serial,station\u0000,reading\n'))).toBe('binary data');
    expect(describeNonText(Buffer.from('serial\u0007,station\n'))).toBe('binary data');
    // UTF-16LE, as some spreadsheet programs save "Unicode text": a NUL after every ASCII letter.
    expect(describeNonText(Buffer.from('serial,station', 'utf16le'))).toBe('binary data');
    // Latin-1 "µ" (B5) alone is not a UTF-8 sequence.
    expect(describeNonText(Buffer.from([0x4b, 0x2d, 0x31, 0xb5, 0x6d]))).toBe('not UTF-8 text');
  });
});
