import { createHash, randomBytes } from 'node:crypto';
import { createServer, type Socket } from 'node:net';
import { CSRF_HEADER, type OutboxMessage, type Page } from '@evenset/contracts';
import { EntityManager } from '@mikro-orm/postgresql';
import { AuditEntry } from '../src/audit/audit-entry.entity';
import { minimalPdf } from '../src/database/factories/certificate-file';
import { MailAttempt } from '../src/mail/mail-attempt.entity';
import { MailMessage } from '../src/mail/mail-message.entity';
import { MailService } from '../src/mail/mail.service';
import { startMailSink, type MailSink } from '../src/mail/sink/mail-sink';
import { capturedMail, freePort } from './setup/mail';
import { Browser, signInAs, startTestApp, TestApp } from './setup/test-app';

const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');

describe('outgoing mail', () => {
  let t: TestApp;
  let port: number;
  let sink: MailSink | null = null;
  let admin: Browser;
  let mail: MailService;

  beforeAll(async () => {
    port = await freePort();
    t = await startTestApp({ SMTP_URL: `smtp://127.0.0.1:${port}`, MAIL_FROM: 'Evenset <evenset@shop.test>' });
    mail = t.app.get(MailService);
    admin = await signInAs(t.app, ['admin']);
  });
  afterAll(async () => {
    await sink?.close();
    await t.close();
  });

  const startSink = async () => {
    sink = await startMailSink({ port, databaseUrl: t.db.url });
  };
  const stopSink = async () => {
    await sink?.close();
    sink = null;
  };
  const outbox = async () => (await admin.agent.get('/api/outbox/messages').expect(200)).body as Page<OutboxMessage>;

  it('hands the message to the mail server, which receives the same subject, text and attachment bytes', async () => {
    await startSink();
    const pdf = minimalPdf('Certificate of conformance - test');
    const bin = randomBytes(4096); // every byte value, to catch any transfer-encoding slip
    const delivery = await mail.send(
      {
        kind: 'certificate',
        recipient: 'buyer@customer.test',
        subject: 'Certificate for set S-0001',
        body: 'Attached is the certificate for set S-0001.\nThank you.',
        attachments: [
          { filename: 'S-0001.pdf', contentType: 'application/pdf', content: pdf },
          { filename: 'data.bin', contentType: 'application/octet-stream', content: bin },
        ],
      },
      null,
    );
    expect(delivery).toEqual({ messageId: expect.any(String), status: 'sent', error: null });

    const [received] = await capturedMail(t.app);
    expect(received!.subject).toBe('Certificate for set S-0001');
    expect(received!.envelopeTo).toEqual(['buyer@customer.test']);
    expect(received!.from?.value[0]?.address).toBe('evenset@shop.test');
    expect(received!.text?.trim()).toBe('Attached is the certificate for set S-0001.\nThank you.');
    expect(received!.attachments.map((a) => [a.filename, a.contentType, sha256(a.content)])).toEqual([
      ['S-0001.pdf', 'application/pdf', sha256(pdf)],
      ['data.bin', 'application/octet-stream', sha256(bin)],
    ]);

    const em = t.app.get(EntityManager).fork();
    const attempts = await em.find(MailAttempt, { message: delivery.messageId });
    expect(attempts).toHaveLength(1);
    expect(attempts[0]).toMatchObject({ outcome: 'sent', error: null });
    expect(attempts[0]!.serverResponse).toMatch(/^250/);
    expect(await em.count(AuditEntry, { action: 'mail.send', subjectId: delivery.messageId })).toBe(1);
  });

  it('records a failed attempt with the reason when the server is down, then a retry sends it', async () => {
    await stopSink();
    const pdf = minimalPdf('Retry me');
    const delivery = await mail.send(
      {
        kind: 'certificate',
        recipient: 'late@customer.test',
        subject: 'Certificate for set S-0002',
        body: 'Here it is.',
        attachments: [{ filename: 'S-0002.pdf', contentType: 'application/pdf', content: pdf }],
      },
      null,
    );
    expect(delivery.status).toBe('failed');
    expect(delivery.error).toBe(`The mail server at 127.0.0.1:${port} did not answer (ECONNREFUSED).`);

    // Nothing lost: the message and its attachment are on record, marked not sent.
    let row = (await outbox()).items.find((m) => m.id === delivery.messageId)!;
    expect(row).toMatchObject({
      status: 'failed',
      lastError: delivery.error,
      attempts: 1,
      attachments: ['S-0002.pdf'],
      recipient: 'late@customer.test',
    });

    await startSink();
    const retried = await admin.agent
      .post(`/api/outbox/messages/${delivery.messageId}/retry`)
      .set(CSRF_HEADER, admin.csrf)
      .expect(200);
    expect(retried.body).toEqual({ messageId: delivery.messageId, status: 'sent', error: null });

    row = (await outbox()).items.find((m) => m.id === delivery.messageId)!;
    expect(row).toMatchObject({ status: 'sent', lastError: null, attempts: 2 });
    const em = t.app.get(EntityManager).fork();
    const attempts = await em.find(MailAttempt, { message: delivery.messageId }, { orderBy: { createdAt: 'asc' } });
    expect(attempts.map((a) => a.outcome)).toEqual(['failed', 'sent']);
    expect(await em.count(AuditEntry, { action: 'mail.retry', subjectId: delivery.messageId })).toBe(1);

    const received = (await capturedMail(t.app)).find((m) => m.subject === 'Certificate for set S-0002');
    expect(received && sha256(received.attachments[0]!.content)).toBe(sha256(pdf));
  });

  it('gives up quickly on a server that takes the connection but never greets', async () => {
    await stopSink();
    // A plain TCP listener: accepts, then says nothing, as a hung mail server would.
    const sockets: Socket[] = [];
    const silent = createServer((socket) => void sockets.push(socket));
    await new Promise<void>((resolve) => silent.listen(port, '127.0.0.1', resolve));
    try {
      const started = Date.now();
      const delivery = await mail.send(
        { kind: 'digest', recipient: 'x@shop.test', subject: 'Silent', body: 'Silent server' },
        null,
      );
      expect(delivery).toMatchObject({
        status: 'failed',
        error: `The mail server at 127.0.0.1:${port} did not answer in time.`,
      });
      expect(Date.now() - started).toBeLessThan(8000);
    } finally {
      sockets.forEach((socket) => socket.destroy());
      await new Promise<void>((resolve) => silent.close(() => resolve()));
    }
    await startSink();
  });

  it('shows what the catcher received, its text and its attachments for download', async () => {
    const list = await admin.agent.get('/api/outbox/captured').expect(200);
    expect(list.body.total).toBe(2);
    const first = list.body.items.find((m: { subject: string }) => m.subject === 'Certificate for set S-0001');
    expect(first).toMatchObject({
      from: 'Evenset <evenset@shop.test>',
      to: ['buyer@customer.test'],
      attachments: [
        { filename: 'S-0001.pdf', contentType: 'application/pdf' },
        { filename: 'data.bin', contentType: 'application/octet-stream', size: 4096 },
      ],
    });
    const detail = await admin.agent.get(`/api/outbox/captured/${first.id}`).expect(200);
    expect(detail.body.text).toContain('Attached is the certificate for set S-0001.');

    const download = await admin.agent
      .get(`/api/outbox/captured/${first.id}/attachments/0`)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(download.headers['content-disposition']).toBe('attachment; filename="S-0001.pdf"');
    expect(sha256(download.body as Buffer)).toBe(sha256(minimalPdf('Certificate of conformance - test')));
    await admin.agent.get(`/api/outbox/captured/${first.id}/attachments/5`).expect(404);
  });

  it('keeps the outbox to admins', async () => {
    const engineer = await signInAs(t.app, ['engineer']);
    await engineer.agent.get('/api/outbox/messages').expect(403);
    await engineer.agent.get('/api/outbox/captured').expect(403);
    const someId = (await t.app.get(EntityManager).fork().findOneOrFail(MailMessage, { kind: 'certificate' })).id;
    await engineer.agent.post(`/api/outbox/messages/${someId}/retry`).set(CSRF_HEADER, engineer.csrf).expect(403);
  });
});

describe('outgoing mail without a mail server configured', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SMTP_URL: '' });
  });
  afterAll(() => t.close());

  it('keeps the message and says why it was not sent', async () => {
    const delivery = await t.app
      .get(MailService)
      .send({ kind: 'digest', recipient: 'a@shop.test', subject: 'Due', body: 'Nothing' }, null);
    expect(delivery).toMatchObject({ status: 'failed', error: 'No mail server is configured (SMTP_URL is not set).' });
    const em = t.app.get(EntityManager).fork();
    expect(await em.count(MailMessage, { id: delivery.messageId })).toBe(1);
  });
});
