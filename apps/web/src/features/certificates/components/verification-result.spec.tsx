import { CERTIFICATE_FORMAT, type CertificateFacts, type Verification } from '@evenset/contracts';
import { render, screen } from '@testing-library/react';
import { VerificationResult } from './verification-result';

const pair = (value: string, mm: string) => ({ value, mm });
const facts: CertificateFacts = {
  format: CERTIFICATE_FORMAT,
  certificateNumber: 'EC-2026-0003',
  verificationCode: 'ACDEFGHJKMNP',
  verifyUrl: 'http://127.0.0.1:3000/verify/ACDEFGHJKMNP',
  issuedAt: '2026-12-02T10:00:00.000Z',
  issuedOn: '2026-12-02',
  issuer: 'Sam Sales',
  shop: { name: 'Kestrel Workholding', address: '14 Millrace Lane' },
  customer: { name: 'Marrow Creek Tooling', orderReference: 'MC-4471' },
  part: {
    partNumber: 'RB-40',
    specRevision: 'B',
    title: 'Riser block',
    unit: 'in',
    nominal: pair('1.50000', '38.1000'),
    bandLower: pair('1.49960', '38.0898'),
    bandUpper: pair('1.50000', '38.1000'),
  },
  set: {
    setNumber: 'S-2026-0001',
    kind: 'set',
    spread: pair('0.00004', '0.0010'),
    matchingBand: pair('0.00020', '0.0051'),
    withinBand: true,
  },
  members: [
    {
      position: 1,
      serial: 'RB40-1181',
      lotNumber: 'L-2025-118',
      height: pair('1.49980', '38.0950'),
      expandedUncertainty: pair('0.000052', '0.00132'),
      coverageFactor: '2',
      inspectedOn: '2026-11-28',
      partTemperature: '20.40',
      masterTemperature: '20.10',
      master: 'MG-1.500-A',
      verdict: 'Conforms',
    },
  ],
  replaces: null,
  masters: [
    {
      code: 'MG-1.500-A',
      description: 'Gauge block',
      calibrationCertificate: 'KW-CAL-2026-0412-R1',
      calibratedOn: '2026-05-02',
      dueOn: '2027-05-02',
    },
  ],
  decisionRule: { kind: 'guarded', text: 'Guarded acceptance (after ISO 14253-1).' },
  uncertaintyStatement: 'Each expanded uncertainty U …',
  accreditationStatement: 'It is not an accredited calibration certificate.',
};
const checkedAt = '2026-12-02T11:00:00.000Z';

describe('VerificationResult', () => {
  it('says genuine in words and lists the signed heights in both units', () => {
    const v: Verification = { status: 'genuine', signatureValid: true, facts, revocation: null, checkedAt };
    render(<VerificationResult verification={v} />);
    expect(screen.getByRole('heading', { name: 'Genuine certificate' })).toBeInTheDocument();
    expect(screen.getByText('RB40-1181')).toBeInTheDocument();
    expect(screen.getByText('1.49980')).toBeInTheDocument();
    expect(screen.getByText('38.0950')).toBeInTheDocument();
    expect(screen.getByText(/KW-CAL-2026-0412-R1/)).toBeInTheDocument();
    expect(screen.getByText('It is not an accredited calibration certificate.')).toBeInTheDocument();
  });

  it('gives the reason of a revocation', () => {
    const v: Verification = {
      status: 'revoked',
      signatureValid: true,
      facts,
      revocation: { reason: 'Issued against the wrong order.', at: '2026-12-02T10:30:00.000Z' },
      checkedAt,
    };
    render(<VerificationResult verification={v} />);
    expect(screen.getByRole('heading', { name: 'Revoked certificate' })).toBeInTheDocument();
    expect(screen.getByText(/Reason: Issued against the wrong order\./)).toBeInTheDocument();
  });

  it('warns not to rely on an altered record, and says the facts shown are not the signed ones', () => {
    const v: Verification = { status: 'altered', signatureValid: false, facts, revocation: null, checkedAt };
    render(<VerificationResult verification={v} />);
    expect(
      screen.getByRole('heading', { name: 'Altered record — do not rely on this certificate' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/which is not what was signed/)).toBeInTheDocument();
  });
});
