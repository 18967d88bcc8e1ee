import { CSRF_HEADER, MAX_CERTIFICATE_BYTES } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { addDays, todayIso } from '../src/common/gauges/gauge-status';
import { minimalPdf } from '../src/database/factories/certificate-file';
import { ensureMaterial } from '../src/database/factories/material.factory';
import { STEEL } from '../src/database/seeders/shop-materials';
import { MasterCalibration } from '../src/masters/master-calibration.entity';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

const PNG = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);

describe('master gauges', () => {
  let t: TestApp;
  let engineer: Browser;
  let inspector: Browser;
  let steelId: string;
  const today = todayIso();

  // Sign-ins hash with scrypt: slow while the API suites run in parallel.
  beforeAll(async () => {
    t = await startTestApp();
    const em = t.app.get(EntityManager).fork();
    steelId = (await ensureMaterial(em, STEEL)).id;
    await em.flush();
    engineer = await signInAs(t.app, ['engineer']);
    inspector = await signInAs(t.app, ['inspector']);
  }, 30_000);
  afterAll(() => t.close());

  const post = (path: string, body?: object) => engineer.agent.post(path).set(CSRF_HEADER, engineer.csrf).send(body);
  const calibrationCount = () => t.app.get(EntityManager).fork().count(MasterCalibration, {});

  const createMaster = async (code: string, nominal = 1.5) =>
    (
      await post('/api/masters', {
        code,
        description: `${nominal} in block`,
        unit: 'in',
        nominal,
        materialId: steelId,
      }).expect(201)
    ).body as { id: string; nominal: number; status: string };

  /** A calibration sent the way a browser form sends it: multipart fields and the file. */
  const calibrate = (
    masterId: string,
    fields: Record<string, string | number> = {},
    file: { content: Buffer; name: string } | null = { content: minimalPdf('KW-1'), name: 'cert.pdf' },
  ) => {
    const form = {
      calibratedOn: addDays(today, -10),
      dueOn: addDays(today, 355),
      unit: 'in',
      calibratedSize: 1.500004,
      expandedUncertainty: 0.000003,
      coverageFactor: 2,
      certificateNumber: 'KW-1',
      ...fields,
    };
    let req = engineer.agent.post(`/api/masters/${masterId}/calibrations`).set(CSRF_HEADER, engineer.csrf);
    for (const [name, value] of Object.entries(form)) req = req.field(name, String(value));
    return file ? req.attach('certificate', file.content, file.name) : req;
  };

  it('creates a master in inches, stores millimetres, and keeps it off the Bench until calibrated', async () => {
    const master = await createMaster('MG-1.500-T');
    expect(master.nominal).toBe(38.1); // 1 in = 25.4 mm exactly (NIST SP 811, App. B)
    expect(master.status).toBe('not-calibrated');
    const usable = await inspector.agent.get('/api/masters').query({ usable: 'true' }).expect(200);
    expect(usable.body.items.map((m: { code: string }) => m.code)).not.toContain('MG-1.500-T');
  });

  it('records a calibration with its certificate, which downloads byte for byte', async () => {
    const master = await createMaster('MG-DL');
    const pdf = minimalPdf('KW-DL');
    const res = await calibrate(master.id, {}, { content: pdf, name: 'scan.PDF' });
    expect(res.status).toBe(201);
    expect(res.body.status).toBe('in-service');
    expect(res.body.current).toMatchObject({
      calibratedSize: 38.1001016, // 1.500004 in
      expandedUncertainty: 0.0000762,
      coverageFactor: 2,
      certificate: { contentType: 'application/pdf', sizeBytes: pdf.length, filename: 'scan.PDF' },
      recordedBy: 'Test engineer',
    });
    const download = await inspector.agent
      .get(`/api/masters/${master.id}/calibrations/${res.body.current.id}/certificate`)
      .buffer(true)
      .parse((response, done) => {
        const chunks: Buffer[] = [];
        response.on('data', (chunk: Buffer) => chunks.push(chunk));
        response.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(download.headers['content-disposition']).toBe('attachment; filename="scan.PDF"');
    expect(Buffer.compare(download.body as Buffer, pdf)).toBe(0);

    const png = await calibrate(master.id, { certificateNumber: 'KW-2' }, { content: PNG, name: 'photo.png' });
    expect(png.status).toBe(201);
    expect(png.body.calibrations).toHaveLength(2);
    const entries = await t.app
      .get(EntityManager)
      .fork()
      .find(AuditEntry, { subjectId: master.id, action: 'master.calibrate' });
    expect(entries).toHaveLength(2);
  });

  it.each([
    ['no file', {}, null, 400, 'FILE_MISSING', 'certificate'],
    [
      'a GIF named .pdf',
      {},
      { content: Buffer.from('GIF89a....'), name: 'cert.pdf' },
      400,
      'FILE_TYPE_REFUSED',
      'certificate',
    ],
    [
      'a file over the size limit',
      {},
      { content: Buffer.concat([minimalPdf('big'), Buffer.alloc(MAX_CERTIFICATE_BYTES)]), name: 'big.pdf' },
      413,
      'FILE_TOO_LARGE',
      'certificate',
    ],
    ['a due date before the calibration', { dueOn: addDays(today, -20) }, undefined, 400, 'VALIDATION_FAILED', 'dueOn'],
    [
      'a size given in mm but marked inches',
      { calibratedSize: 38.1 },
      undefined,
      400,
      'VALIDATION_FAILED',
      'calibratedSize',
    ],
    [
      'a calibration date in the future',
      { calibratedOn: addDays(today, 2) },
      undefined,
      400,
      'VALIDATION_FAILED',
      'calibratedOn',
    ],
    ['a size that is not a number', { calibratedSize: '1.2.3' }, undefined, 400, 'VALIDATION_FAILED', 'calibratedSize'],
    ['a coverage factor of 0.5', { coverageFactor: 0.5 }, undefined, 400, 'VALIDATION_FAILED', 'coverageFactor'],
  ] as const)('refuses %s, naming the field, and saves nothing', async (_case, fields, file, status, code, path) => {
    const master = await createMaster(`MG-R-${Math.random().toString(36).slice(2, 7)}`);
    const before = await calibrationCount();
    const res = await calibrate(master.id, fields, file);
    expect(res.status).toBe(status);
    expect(res.body.code).toBe(code);
    expect((res.body.details as { path: string }[]).map((d) => d.path)).toContain(path);
    if (code === 'FILE_TOO_LARGE') expect(res.body.message).toMatch(/10 MB/);
    expect(await calibrationCount()).toBe(before);
  });

  it('corrects a calibration with a new record that supersedes the old one, with a reason', async () => {
    const master = await createMaster('MG-CORR');
    const first = (await calibrate(master.id).expect(201)).body.current as { id: string };

    const noReason = await calibrate(master.id, { supersedesId: first.id, certificateNumber: 'KW-1-R1' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.details[0].path).toBe('reason');

    const reason = 'Lab reissued the certificate: size mistyped.';
    const fixed = await calibrate(master.id, {
      supersedesId: first.id,
      reason,
      certificateNumber: 'KW-1-R1',
      calibratedSize: 1.500002,
    });
    expect(fixed.status).toBe(201);
    expect(fixed.body.current).toMatchObject({ supersedesId: first.id, reason, calibratedSize: 38.1000508 });
    const old = (
      fixed.body.calibrations as { id: string; supersededById: string | null; calibratedSize: number }[]
    ).find((c) => c.id === first.id);
    expect(old).toMatchObject({ supersededById: fixed.body.current.id, calibratedSize: 38.1001016 });

    const again = await calibrate(master.id, { supersedesId: first.id, reason: 'Twice', certificateNumber: 'KW-1-R2' });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('CALIBRATION_ALREADY_SUPERSEDED');

    const [entry] = await t.app
      .get(EntityManager)
      .fork()
      .find(AuditEntry, { subjectId: master.id, action: 'master.calibration-correct' });
    expect(entry?.reason).toBe(reason);
    expect(entry?.before).toMatchObject({ calibrationId: first.id, calibratedSizeMm: 38.1001016 });
  });

  it('keeps calibrations permanent: the database refuses to change or remove one', async () => {
    const master = await createMaster('MG-PERM');
    await calibrate(master.id).expect(201);
    const conn = t.app.get(EntityManager).getConnection();
    await expect(conn.execute(`update master_calibration set calibrated_size_mm = 1`)).rejects.toThrow(/permanent/);
    await expect(conn.execute(`delete from master_calibration`)).rejects.toThrow(/permanent/);
    await expect(conn.execute(`truncate master_calibration cascade`)).rejects.toThrow(/permanent/);
    await expect(conn.execute(`update calibration_certificate set content = 'x'`)).rejects.toThrow(/permanent/);
  });

  it('derives due soon and overdue from the due date, and lists only usable masters for the Bench', async () => {
    const dueSoon = await createMaster('MG-SOON');
    await calibrate(dueSoon.id, { calibratedOn: addDays(today, -355), dueOn: addDays(today, 10) }).expect(201);
    const overdue = await createMaster('MG-LATE');
    await calibrate(overdue.id, { calibratedOn: addDays(today, -366), dueOn: addDays(today, -1) }).expect(201);
    const retired = await createMaster('MG-GONE');
    await calibrate(retired.id).expect(201);
    const gone = await post(`/api/masters/${retired.id}/retire`, { reason: 'Dropped on the plate; face dented.' });
    expect(gone.status).toBe(200);
    expect(gone.body).toMatchObject({ status: 'retired', retiredReason: 'Dropped on the plate; face dented.' });
    expect((await post(`/api/masters/${retired.id}/retire`, { reason: 'again' })).body.code).toBe('GAUGE_RETIRED');
    expect((await calibrate(retired.id)).body.code).toBe('GAUGE_RETIRED');

    const all = await inspector.agent.get('/api/masters').query({ q: 'MG-', pageSize: 100 }).expect(200);
    const status = Object.fromEntries(all.body.items.map((m: { code: string; status: string }) => [m.code, m.status]));
    expect(status).toMatchObject({
      'MG-SOON': 'due-soon',
      'MG-LATE': 'overdue',
      'MG-GONE': 'retired',
      'MG-DL': 'in-service',
    });
    const usable = await inspector.agent.get('/api/masters').query({ usable: 'true', pageSize: 100 }).expect(200);
    const codes = usable.body.items.map((m: { code: string }) => m.code);
    expect(codes).toEqual(expect.arrayContaining(['MG-SOON', 'MG-DL']));
    expect(codes).not.toContain('MG-GONE');
    expect(codes).not.toContain('MG-LATE');
    expect(usable.body.total).toBe(codes.length);
  });

  it('lets an inspector read but not manage masters', async () => {
    const res = await inspector.agent
      .post('/api/masters')
      .set(CSRF_HEADER, inspector.csrf)
      .send({ code: 'MG-X', description: 'x', unit: 'mm', nominal: 10, materialId: steelId });
    expect(res.status).toBe(403);
    const twin = await post('/api/masters', {
      code: 'mg-dl',
      description: 'x',
      unit: 'mm',
      nominal: 10,
      materialId: steelId,
    });
    expect(twin.status).toBe(409);
    expect(twin.body.details[0].path).toBe('code');
  });
});
