import { EntityManager } from '@mikro-orm/postgresql';
import { SchedulerRegistry } from '@nestjs/schedule';
import { validateEnv } from '../src/config/env.schema';
import { ensureMaster } from '../src/database/factories/master.factory';
import { ensureMaterial } from '../src/database/factories/material.factory';
import { demoMasters } from '../src/database/seeders/demo-gauges';
import { STEEL } from '../src/database/seeders/shop-materials';
import { DIGEST_JOB, DueDigestService } from '../src/mail/due-digest.service';
import { MailMessage } from '../src/mail/mail-message.entity';
import { MasterGauge } from '../src/masters/master-gauge.entity';
import { startMailSink, type MailSink } from '../src/mail/sink/mail-sink';
import { User } from '../src/users/user.entity';
import { capturedMail, freePort } from './setup/mail';
import { givenUser, startTestApp, TestApp } from './setup/test-app';

// Calendar arithmetic for the expected lines is done here with Date.UTC, independently of the app.
const plusDays = (iso: string, n: number) => {
  const [y, m, d] = iso.split('-').map(Number);
  return new Date(Date.UTC(y!, m! - 1, d! + n)).toISOString().slice(0, 10);
};

describe('calibration-due digest', () => {
  let t: TestApp;
  let sink: MailSink;
  let digest: DueDigestService;
  const today = '2027-03-01';

  beforeAll(async () => {
    const port = await freePort();
    t = await startTestApp({ SMTP_URL: `smtp://127.0.0.1:${port}` });
    sink = await startMailSink({ port, databaseUrl: t.db.url });
    digest = t.app.get(DueDigestService);
  });
  afterAll(async () => {
    await sink.close();
    await t.close();
  });

  it('registers the daily job with the scheduler', () => {
    const job = t.app.get(SchedulerRegistry).getCronJob(DIGEST_JOB);
    expect(job.cronTime.source).toBe('0 6 * * *');
  });

  it('refuses a schedule that is not a cron expression', () => {
    expect(() =>
      validateEnv({ DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db', MAIL_DIGEST_CRON: 'every morning' }),
    ).toThrow(/MAIL_DIGEST_CRON: Use a cron expression/);
  });

  it('sends nothing when no master is due', async () => {
    await givenUser(t.app, ['engineer']);
    expect(await digest.sendDueDigest(today)).toEqual([]);
    expect(await t.app.get(EntityManager).fork().count(MailMessage, { kind: 'digest' })).toBe(0);
  });

  it('lists the due and overdue demo masters for each active engineer, once a day', async () => {
    const em = t.app.get(EntityManager).fork();
    const steel = await ensureMaterial(em, STEEL);
    await em.flush();
    // The demo factory dates its masters from `today`: due in 165 days, in 12 days, and 5 days ago.
    for (const master of demoMasters(steel, today)) await ensureMaster(em, master);
    await em.flush();

    const engineer = await givenUser(t.app, ['engineer', 'inspector'], 'eng-digest@test.example');
    const away = await givenUser(t.app, ['engineer'], 'eng-away@test.example');
    await em.nativeUpdate(User, { id: away.id }, { active: false });
    await givenUser(t.app, ['inspector'], 'insp-digest@test.example');

    const deliveries = await digest.sendDueDigest(today);
    expect(deliveries.every((d) => d.status === 'sent')).toBe(true);

    const received = (await capturedMail(t.app)).filter((m) => m.subject === `Masters due for calibration (${today})`);
    const recipients = received.flatMap((m) => m.envelopeTo);
    expect(recipients).toContain('eng-digest@test.example');
    expect(recipients).not.toContain('eng-away@test.example');
    expect(recipients).not.toContain('insp-digest@test.example');
    expect(recipients).toHaveLength(deliveries.length);

    const text = received.find((m) => m.envelopeTo.includes(engineer.email))!.text ?? '';
    const lines = text.split('\n').filter((line) => line.startsWith('- '));
    expect(lines).toEqual([
      `- MG-12-A: 12 mm steel master block for LR-90, due ${plusDays(today, -5)} (5 days overdue)`,
      `- MG-1.000-A: 1.0000 in steel master block for PP-6, due ${plusDays(today, 12)} (12 days left)`,
    ]);
    expect(text).not.toContain('MG-1.500-A');

    // The same day again: nothing new. The next day: a new digest.
    expect(await digest.sendDueDigest(today)).toEqual([]);
    expect(await em.count(MailMessage, { kind: 'digest', subjectId: engineer.id })).toBe(1);
    expect((await digest.sendDueDigest(plusDays(today, 1))).length).toBe(deliveries.length);
  });

  it('leaves out retired masters', async () => {
    const em = t.app.get(EntityManager).fork();
    await em.nativeUpdate(MasterGauge, { code: 'MG-12-A' }, { retiredAt: new Date(), retiredReason: 'Worn' });
    const due = await digest.dueMasters(today);
    expect(due.map((m) => [m.code, m.daysLeft])).toEqual([['MG-1.000-A', 12]]);
  });
});
