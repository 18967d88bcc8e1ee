import type { CertificateFacts } from '@evenset/contracts';
import PDFDocument from 'pdfkit';
import { toBuffer } from 'qrcode';

/*
 * The certificate as a one-page A4 PDF, drawn only from the signed facts, so what is printed is
 * exactly what the signature covers. Standard fonts only (Helvetica, bundled with pdfkit).
 */

const MARGIN = 42;
const INK = '#1d2a33';
const MUTED = '#5b6770';
const RULE = '#c7d0d6';
const BAND = '#eef3f5';
const ACCENT = '#1f5f73';

interface Column {
  title: string;
  width: number;
  align?: 'left' | 'right';
}

type Doc = PDFKit.PDFDocument;

function rule(doc: Doc, y: number): void {
  doc
    .moveTo(MARGIN, y)
    .lineTo(doc.page.width - MARGIN, y)
    .lineWidth(0.6)
    .strokeColor(RULE)
    .stroke();
}

function heading(doc: Doc, text: string): void {
  doc.moveDown(0.6).font('Helvetica-Bold').fontSize(9.5).fillColor(ACCENT).text(text, MARGIN);
  doc.moveDown(0.2);
}

/** Label/value pairs in two columns. */
function facts(doc: Doc, pairs: [string, string][]): void {
  const half = (doc.page.width - 2 * MARGIN) / 2;
  for (let i = 0; i < pairs.length; i += 2) {
    const y = doc.y;
    let bottom = y;
    pairs.slice(i, i + 2).forEach(([label, value], j) => {
      const x = MARGIN + j * half;
      doc
        .font('Helvetica')
        .fontSize(7.5)
        .fillColor(MUTED)
        .text(label, x, y, { width: half - 10 });
      doc
        .font('Helvetica')
        .fontSize(9.5)
        .fillColor(INK)
        .text(value, x, doc.y, { width: half - 10 });
      bottom = Math.max(bottom, doc.y);
    });
    doc.y = bottom + 3;
  }
}

function table(doc: Doc, columns: Column[], rows: string[][]): void {
  const total = columns.reduce((s, c) => s + c.width, 0);
  const scale = (doc.page.width - 2 * MARGIN) / total;
  const widths = columns.map((c) => c.width * scale);
  const row = (cells: string[], bold: boolean, fill: string | null) => {
    const y = doc.y;
    doc.font(bold ? 'Helvetica-Bold' : 'Helvetica').fontSize(8);
    const height = Math.max(...cells.map((cell, i) => doc.heightOfString(cell, { width: widths[i]! - 6 }))) + 6;
    if (fill) doc.rect(MARGIN, y, doc.page.width - 2 * MARGIN, height).fill(fill);
    let x = MARGIN;
    cells.forEach((cell, i) => {
      doc
        .fillColor(bold ? ACCENT : INK)
        .text(cell, x + 3, y + 3, { width: widths[i]! - 6, align: columns[i]!.align ?? 'left' });
      x += widths[i]!;
    });
    doc.y = y + height;
    rule(doc, doc.y);
  };
  row(
    columns.map((c) => c.title),
    true,
    BAND,
  );
  rows.forEach((cells) => row(cells, false, null));
  doc.x = MARGIN;
}

/** Renders the certificate; `facts` must be the parsed payload as signed. */
export async function renderCertificatePdf(facts: CertificateFacts): Promise<Buffer> {
  const qr = await toBuffer(facts.verifyUrl, { type: 'png', margin: 1, width: 220, errorCorrectionLevel: 'M' });
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    info: {
      Title: `Certificate of conformance ${facts.certificateNumber}`,
      Author: facts.shop.name,
      Subject: `${facts.part.partNumber} set ${facts.set.setNumber}`,
      CreationDate: new Date(facts.issuedAt),
    },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  draw(doc, facts, qr);
  doc.end();
  return finished;
}

function draw(doc: Doc, f: CertificateFacts, qr: Buffer): void {
  const u = f.part.unit;
  const width = doc.page.width - 2 * MARGIN;

  // Title and shop block.
  doc.font('Helvetica-Bold').fontSize(19).fillColor(INK).text('Certificate of conformance', MARGIN, MARGIN);
  doc
    .font('Helvetica')
    .fontSize(9)
    .fillColor(MUTED)
    .text(`No. ${f.certificateNumber}`, MARGIN, doc.y + 2);
  doc
    .font('Helvetica-Bold')
    .fontSize(10.5)
    .fillColor(INK)
    .text(f.shop.name, MARGIN + width / 2, MARGIN, { width: width / 2, align: 'right' });
  doc
    .font('Helvetica')
    .fontSize(8.5)
    .fillColor(MUTED)
    .text(f.shop.address, MARGIN + width / 2, doc.y, { width: width / 2, align: 'right' });
  doc.y = Math.max(doc.y, MARGIN + 44);
  rule(doc, doc.y);
  doc.moveDown(0.6);

  facts(doc, [
    ['Issued on', f.issuedOn],
    ['Issued by', f.issuer],
    ['Customer', f.customer.name],
    ['Order reference', f.customer.orderReference],
    ['Part number and spec revision', `${f.part.partNumber} rev ${f.part.specRevision} — ${f.part.title}`],
    [f.set.kind === 'replacement' ? 'Replacement set' : 'Matched set', f.set.setNumber],
    [`Nominal height (${u})`, `${f.part.nominal.value} ${u}` + (u === 'mm' ? '' : ` (${f.part.nominal.mm} mm)`)],
    [
      'Tolerance band',
      `${f.part.bandLower.value} to ${f.part.bandUpper.value} ${u}` +
        (u === 'mm' ? '' : ` (${f.part.bandLower.mm} to ${f.part.bandUpper.mm} mm)`),
    ],
  ]);

  heading(doc, 'Measured heights');
  table(
    doc,
    [
      { title: 'Serial', width: 52 },
      { title: 'Lot', width: 58 },
      { title: `Height (${u})`, width: 56, align: 'right' },
      ...(u === 'mm' ? [] : [{ title: 'Height (mm)', width: 56, align: 'right' as const }]),
      { title: `U (k=${f.members[0]?.coverageFactor ?? '2'})`, width: 82, align: 'right' },
      { title: 'Inspected', width: 56 },
      { title: 'Part / master °C', width: 54 },
      { title: 'Master', width: 66 },
      { title: 'Verdict', width: 54 },
    ],
    f.members.map((m) => [
      m.serial,
      m.lotNumber,
      m.height.value,
      ...(u === 'mm' ? [] : [m.height.mm]),
      u === 'mm'
        ? `${m.expandedUncertainty.mm} mm`
        : `${m.expandedUncertainty.value} in (${m.expandedUncertainty.mm} mm)`,
      m.inspectedOn,
      `${m.partTemperature} / ${m.masterTemperature}`,
      m.master,
      m.verdict,
    ]),
  );
  doc.moveDown(0.4);
  const both = (p: { value: string; mm: string }) => (u === 'mm' ? `${p.mm} mm` : `${p.value} in (${p.mm} mm)`);
  doc
    .font('Helvetica-Bold')
    .fontSize(9)
    .fillColor(INK)
    .text(
      `Set spread ${both(f.set.spread)} against a matching band of ${both(f.set.matchingBand)}: ` +
        (f.set.withinBand ? 'within the band.' : 'NOT within the band.'),
      MARGIN,
      doc.y,
      { width },
    );

  if (f.replaces) {
    heading(doc, `Replacement for set ${f.replaces.setNumber}`);
    doc
      .font('Helvetica')
      .fontSize(8.5)
      .fillColor(INK)
      .text(
        `Matches the set sold as ${f.replaces.setNumber}: ` +
          f.replaces.members.map((m) => `${m.serial} ${both(m.height)}`).join('; ') +
          '.',
        MARGIN,
        doc.y,
        { width },
      );
  }

  heading(doc, 'Master gauges');
  table(
    doc,
    [
      { title: 'Master', width: 60 },
      { title: 'Description', width: 150 },
      { title: 'Calibration certificate', width: 100 },
      { title: 'Calibrated on', width: 70 },
      { title: 'Due on', width: 70 },
    ],
    f.masters.map((m) => [m.code, m.description, m.calibrationCertificate, m.calibratedOn, m.dueOn]),
  );

  heading(doc, 'Decision rule and uncertainty');
  doc.font('Helvetica').fontSize(8.5).fillColor(INK).text(f.decisionRule.text, MARGIN, doc.y, { width });
  doc.moveDown(0.3).text(f.uncertaintyStatement, { width });
  doc.moveDown(0.3).font('Helvetica-Bold').text(f.accreditationStatement, { width });

  // Issuer and verification, kept together at the foot of the page.
  const qrSize = 84;
  const top = Math.max(doc.y + 14, doc.page.height - MARGIN - qrSize - 4);
  rule(doc, top - 6);
  doc
    .font('Helvetica')
    .fontSize(7.5)
    .fillColor(MUTED)
    .text('Issued by', MARGIN, top)
    .font('Helvetica')
    .fontSize(10)
    .fillColor(INK)
    .text(`${f.issuer}, ${f.shop.name}`, MARGIN, doc.y)
    .fontSize(8.5)
    .text(`on ${f.issuedOn}`, MARGIN, doc.y);
  doc
    .moveDown(0.6)
    .font('Helvetica')
    .fontSize(7.5)
    .fillColor(MUTED)
    .text('Verification code', MARGIN, doc.y)
    .font('Courier-Bold')
    .fontSize(12)
    .fillColor(INK)
    .text(f.verificationCode, MARGIN, doc.y)
    .font('Helvetica')
    .fontSize(8)
    .fillColor(MUTED)
    .text(`Check this certificate at ${f.verifyUrl}`, MARGIN, doc.y, { width: width - qrSize - 12 });
  doc.image(qr, doc.page.width - MARGIN - qrSize, top, { width: qrSize, height: qrSize });
}
