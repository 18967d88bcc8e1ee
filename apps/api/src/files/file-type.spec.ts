import { detectCertificateType, safeFilename } from './file-type';

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
