import { createHash, generateKeyPairSync, verify } from 'node:crypto';
import {
  CSRF_HEADER,
  type CalibrationRecorded,
  type Certificate as CertificateView,
  type CertificateEmailed,
  type CertificateFacts,
  type Page,
  type Verification,
} from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { Client } from 'pg';
import { addDays, todayIso } from '../src/common/gauges/gauge-status';
import { Certificate } from '../src/certificates/certificate.entity';
import { CustomerOrder } from '../src/customers/customer-order.entity';
import { Customer } from '../src/customers/customer.entity';
import { minimalPdf } from '../src/database/factories/certificate-file';
import { InspectionResult } from '../src/inspections/inspection-result.entity';
import { Part } from '../src/lots/part.entity';
import { startMailSink, type MailSink } from '../src/mail/sink/mail-sink';
import { MatchedSet } from '../src/sets/matched-set.entity';
import { SetMember } from '../src/sets/set-member.entity';
import { Bench, givenBench, givenLot, partRows, post, topReadings } from './setup/bench';
import { capturedMail, freePort } from './setup/mail';
import { pdfText } from './setup/pdf-text';
import { anonymousBrowser, Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

/**
 * RB-40 rev B (inches, guarded rule, matching band 0.0002 in) measured at 20 °C against MG-1.500-A
 * (calibrated size 38.10008 mm): height = 38.10008 mm + reading × 25.4 mm/in, no thermal
 * correction at 20 °C. 1 in = 25.4 mm exactly (NIST SP 811, App. B). The expected texts below are
 * those values worked by hand and rounded half up to 0.00001 in and 0.0001 mm.
 */
const READINGS: Record<string, { reading: number; inch: string; mm: string }> = {
  'C-1': { reading: -0.0002, inch: '1.49980', mm: '38.0950' }, // 38.095000 mm = 1.4998031 in
  'C-2': { reading: -0.00022, inch: '1.49978', mm: '38.0945' }, // 38.094492 mm = 1.4997832 in
  'C-3': { reading: -0.00018, inch: '1.49982', mm: '38.0955' }, // 38.095508 mm = 1.4998232 in
  'C-4': { reading: -0.00021, inch: '1.49979', mm: '38.0947' }, // 38.094746 mm = 1.4997932 in
};

async function sql(t: TestApp, text: string): Promise<void> {
  const client = new Client({ connectionString: t.db.url });
  await client.connect();
  try {
    await client.query(text);
  } finally {
    await client.end();
  }
}

describe('certificates of conformance', () => {
  let t: TestApp;
  let bench: Bench;
  let sales: Browser;
  let service: Browser;
  let sink: MailSink;
  const keys = generateKeyPairSync('ed25519');
  const publicDer = keys.publicKey.export({ format: 'der', type: 'spki' });

  beforeAll(async () => {
    const smtpPort = await freePort();
    t = await startTestApp({
      CERTIFICATE_SIGNING_KEY: keys.privateKey.export({ format: 'pem', type: 'pkcs8' }).toString(),
      SHOP_NAME: 'Kestrel Workholding',
      SHOP_ADDRESS: '14 Millrace Lane, Harwick',
      PUBLIC_URL: 'https://evenset.kestrel.test/',
      SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
    });
    sink = await startMailSink({ port: smtpPort, databaseUrl: t.db.url });
    bench = await givenBench(t);
    sales = await signInAs(t.app, ['sales']);
    service = await signInAs(t.app, ['service']);
  }, 60_000);
  afterAll(async () => {
    await sink.close();
    await t.close();
  });

  /** Parts measured at 20 °C, released when asked, allocated to a customer's order as a set. */
  async function givenSet(setNumber: string, lotNumber: string, serials: string[], release: boolean) {
    const lot = await givenLot(bench, lotNumber, serials);
    const ids = Object.fromEntries((await partRows(bench, lot.id)).items.map((r) => [r.serial, r.id]));
    const run = await post(bench.inspector, '/api/runs', {
      lotId: lot.id,
      masterId: bench.master.id,
      instrumentId: bench.indicator.id,
      unit: 'in',
      masterTemperature: 20,
      partTemperature: 20,
      masterStartReading: 0,
    }).expect(201);
    for (const serial of serials) {
      await post(bench.inspector, `/api/runs/${run.body.id}/inspections`, {
        partId: ids[serial],
        unit: 'in',
        readings: topReadings([READINGS[serial.replace(/^.*-/, 'C-')]!.reading]),
      }).expect(201);
      if (release) await post(bench.engineer, `/api/parts/${ids[serial]}/release`, {}).expect(201);
    }
    const em = t.app.get(EntityManager).fork();
    const customer =
      (await em.findOne(Customer, { name: 'Harbor Tool & Die' })) ??
      em.create(Customer, { name: 'Harbor Tool & Die', contactEmail: 'buyer@harbor.test', createdAt: new Date() });
    const order = em.create(CustomerOrder, { customer, reference: `PO-${setNumber}`, createdAt: new Date() });
    const set = em.create(MatchedSet, {
      setNumber,
      order,
      partNumber: 'RB-40',
      kind: 'set',
      matchingBandMm: 0.00508,
      allocatedByName: 'Test sales',
      createdAt: new Date(),
    });
    const parts = await em.find(Part, { id: { $in: Object.values(ids) } }, { orderBy: { serial: 'asc' } });
    for (const [i, part] of parts.entries()) {
      const result = await em.findOneOrFail(
        InspectionResult,
        { inspection: { part } },
        { orderBy: { createdAt: 'desc' } },
      );
      em.persist(
        em.create(SetMember, { set, part, position: i + 1, result, heightMm: result.heightMm, createdAt: new Date() }),
      );
    }
    await em.flush();
    return { set, customer };
  }

  let setId: string;
  let certificate: CertificateView;

  it('issues a certificate whose payload is signed by the configured key', async () => {
    const { set } = await givenSet('S-CERT-1', 'L-CERT-1', Object.keys(READINGS), true);
    setId = set.id;
    const res = await post(sales, `/api/sets/${setId}/certificates`).expect(201);
    certificate = res.body as CertificateView;
    expect(certificate).toMatchObject({
      certificateNumber: `EC-${new Date().getUTCFullYear()}-0001`,
      setNumber: 'S-CERT-1',
      customerName: 'Harbor Tool & Die',
      orderReference: 'PO-S-CERT-1',
      status: 'genuine',
      revocation: null,
    });
    expect(certificate.verificationCode).toMatch(/^[ACDEFGHJKMNPQRTUVWXY34679]{12}$/);

    const row = await t.app.get(EntityManager).fork().findOneOrFail(Certificate, { id: certificate.id });
    // keyId = SHA-256 of the public key's DER, computed here with Node's crypto.
    expect(row.keyId).toBe(createHash('sha256').update(publicDer).digest('hex'));
    expect(verify(null, Buffer.from(row.payload, 'utf8'), keys.publicKey, Buffer.from(row.signature, 'base64'))).toBe(
      true,
    );
    // Canonical: no whitespace, keys sorted, lengths as strings.
    const facts = JSON.parse(row.payload) as CertificateFacts;
    expect(row.payload).not.toMatch(/\s"|":\s/);
    expect(Object.keys(facts)).toEqual([...Object.keys(facts)].sort());
    expect(facts.members.map((m) => [m.serial, m.height.value, m.height.mm])).toEqual(
      Object.entries(READINGS).map(([serial, r]) => [serial, r.inch, r.mm]),
    );
    // Spread 38.095508 − 38.094492 = 0.001016 mm = 0.00004 in; band 0.0002 in = 0.00508 mm.
    expect(facts.set).toMatchObject({
      spread: { value: '0.00004', mm: '0.0010' },
      matchingBand: { value: '0.00020', mm: '0.0051' },
      withinBand: true,
    });
    expect(facts.verifyUrl).toBe(`https://evenset.kestrel.test/verify/${certificate.verificationCode}`);
    expect(facts.members.every((m) => m.partTemperature === '20.00' && m.coverageFactor === '2')).toBe(true);
  });

  it('numbers the next certificate in sequence', async () => {
    const res = await post(sales, `/api/sets/${setId}/certificates`).expect(201);
    expect((res.body as CertificateView).certificateNumber).toBe(`EC-${new Date().getUTCFullYear()}-0002`);
  });

  it('prints every serial, both heights, the uncertainty, the decision rule and the statement in the PDF', async () => {
    const res = await service.agent
      .get(`/api/certificates/${certificate.id}/pdf`)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${certificate.certificateNumber}.pdf"`);
    const { text, pages } = pdfText(res.body as Buffer);
    expect(pages).toBe(1);
    const flat = text.replace(/\s+/g, ' ');
    for (const [serial, r] of Object.entries(READINGS)) {
      expect(flat).toContain(serial);
      expect(flat).toContain(r.inch);
      expect(flat).toContain(r.mm);
    }
    expect(flat).toContain('Certificate of conformance');
    expect(flat).toContain(certificate.certificateNumber);
    expect(flat).toContain(certificate.verificationCode);
    expect(flat).toContain('Kestrel Workholding');
    expect(flat).toContain('Harbor Tool & Die');
    expect(flat).toContain('expanded uncertainty U');
    expect(flat).toContain('coverage factor k');
    expect(flat).toContain('Guarded acceptance');
    expect(flat).toContain('It is not an accredited calibration certificate.');
    const current = bench.master.currentCalibration!;
    expect(flat).toContain(current.certificateNumber);
    expect(flat).toContain(current.dueOn);
  });

  it('shows the public check as genuine, without signing in', async () => {
    const anon = await anonymousBrowser(t.app);
    const res = await anon.agent.get(`/api/verify/${certificate.verificationCode}`).expect(200);
    const body = res.body as Verification;
    expect(body.status).toBe('genuine');
    expect(body.signatureValid).toBe(true);
    expect(body.facts!.members).toHaveLength(4);
    expect(body.revocation).toBeNull();
    const unknown = await anon.agent.get('/api/verify/NOSUCHCODE').expect(404);
    expect(unknown.body.message).toMatch(/No certificate has this verification code/);
  });

  it('sends the PDF to the customer’s contact by default', async () => {
    const res = await post(sales, `/api/certificates/${certificate.id}/email`, {}).expect(200);
    const sent = res.body as CertificateEmailed;
    expect(sent).toMatchObject({ status: 'sent', error: null, recipient: 'buyer@harbor.test' });
    const mail = (await capturedMail(t.app)).find((m) => m.subject?.includes(certificate.certificateNumber));
    expect(mail?.envelopeTo).toEqual(['buyer@harbor.test']);
    const attachment = mail!.attachments.find((a) => a.filename === `${certificate.certificateNumber}.pdf`)!;
    expect(pdfText(attachment.content).text).toContain(certificate.verificationCode);
    await post(sales, `/api/certificates/${certificate.id}/email`, { recipient: 'not-an-address' }).expect(400);
  });

  it('refuses a set with a part that is not released, naming it', async () => {
    const { set } = await givenSet('S-CERT-2', 'L-CERT-2', ['D-1', 'D-2'], false);
    const res = await post(sales, `/api/sets/${set.id}/certificates`).expect(409);
    expect(res.body.code).toBe('CERTIFICATE_REFUSED');
    expect(res.body.message).toMatch(/D-1 is inspected but not released, D-2 is inspected but not released/);
    expect(await t.app.get(EntityManager).fork().count(Certificate, { set: set.id })).toBe(0);
    await post(sales, '/api/sets/00000000-0000-4000-8000-000000000000/certificates').expect(404);
  });

  it('lists and finds certificates by set, number and customer', async () => {
    const bySet = (await service.agent.get('/api/certificates').query({ setId }).expect(200))
      .body as Page<CertificateView>;
    expect(bySet.total).toBe(2);
    const byNumber = (
      await service.agent.get('/api/certificates').query({ q: certificate.certificateNumber }).expect(200)
    ).body as Page<CertificateView>;
    expect(byNumber.items.map((c) => c.id)).toEqual([certificate.id]);
    const byCustomer = (await service.agent.get('/api/certificates').query({ q: 'harbor tool' }).expect(200))
      .body as Page<CertificateView>;
    expect(byCustomer.total).toBe(2);
    const none = (await service.agent.get('/api/certificates').query({ q: '100%' }).expect(200))
      .body as Page<CertificateView>;
    expect(none.total).toBe(0);
  });

  it('revokes once with a reason, and the public check says revoked and why', async () => {
    await post(bench.engineer, `/api/certificates/${certificate.id}/revocation`, {}).expect(400);
    const revoked = await post(bench.engineer, `/api/certificates/${certificate.id}/revocation`, {
      reason: 'Issued against the wrong order.',
    }).expect(200);
    expect((revoked.body as CertificateView).status).toBe('revoked');
    const again = await post(bench.engineer, `/api/certificates/${certificate.id}/revocation`, {
      reason: 'Twice.',
    }).expect(409);
    expect(again.body.message).toMatch(/already revoked.*Issued against the wrong order/);
    const check = (await (await anonymousBrowser(t.app)).agent.get(`/api/verify/${certificate.verificationCode}`))
      .body as Verification;
    expect(check.status).toBe('revoked');
    expect(check.revocation?.reason).toBe('Issued against the wrong order.');
    await post(sales, `/api/certificates/${certificate.id}/email`, {}).expect(409);
  });

  it('shows a certificate whose stored facts were edited in the database as altered', async () => {
    const second = (await service.agent.get('/api/certificates').query({ setId, sort: 'certificateNumber:desc' }))
      .body as Page<CertificateView>;
    const target = second.items[0]!;
    expect(target.status).toBe('genuine');
    await sql(
      t,
      `alter table certificate disable trigger user;
       update certificate set payload = replace(payload, '"1.49980"', '"1.49990"') where id = '${target.id}';
       alter table certificate enable trigger user;`,
    );
    const check = (
      await (await anonymousBrowser(t.app)).agent.get(`/api/verify/${target.verificationCode}`).expect(200)
    ).body as Verification;
    expect(check.status).toBe('altered');
    expect(check.signatureValid).toBe(false);
    expect(check.facts?.members[0]?.height.value).toBe('1.49990');
    const listed = (await service.agent.get(`/api/certificates/${target.id}`).expect(200)).body as CertificateView;
    expect(listed.status).toBe('altered');
  });

  it('lists the set’s certificates in the impact report of a master correction', async () => {
    const current = bench.master.currentCalibration!;
    const form: Record<string, string | number> = {
      calibratedOn: addDays(todayIso(), -5),
      dueOn: addDays(todayIso(), 360),
      unit: 'mm',
      calibratedSize: 38.1001,
      expandedUncertainty: 0.00008,
      coverageFactor: 2,
      certificateNumber: 'KW-CERT-R1',
      supersedesId: current.id,
      reason: 'Calibration laboratory reissued the certificate.',
    };
    let req = bench.engineer.agent
      .post(`/api/masters/${bench.master.id}/calibrations`)
      .set(CSRF_HEADER, bench.engineer.csrf);
    for (const [name, value] of Object.entries(form)) req = req.field(name, String(value));
    const impact = (
      (await req.attach('certificate', minimalPdf('KW-CERT-R1'), 'cert.pdf').expect(201)).body as CalibrationRecorded
    ).impact!;
    expect(impact.recomputed).toBeGreaterThanOrEqual(4);
    expect(impact.certificates.map((c) => c.certificateNumber).sort()).toEqual([
      `EC-${new Date().getUTCFullYear()}-0001`,
      `EC-${new Date().getUTCFullYear()}-0002`,
    ]);
    expect(impact.certificates.find((c) => c.id === certificate.id)).toMatchObject({
      setNumber: 'S-CERT-1',
      customerName: 'Harbor Tool & Die',
      revoked: true,
    });
  });
});
