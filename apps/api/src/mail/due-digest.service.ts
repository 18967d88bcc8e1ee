import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { SchedulerRegistry } from '@nestjs/schedule';
import { CronJob } from 'cron';
import { addDays, todayIso } from '../common/gauges/gauge-status';
import { AppConfig } from '../config/app-config.service';
import { MasterGauge } from '../masters/master-gauge.entity';
import { User } from '../users/user.entity';
import { MailMessage } from './mail-message.entity';
import { MailService, type MailDelivery } from './mail.service';

/** How far ahead the morning digest looks. */
export const DIGEST_WINDOW_DAYS = 14;
export const DIGEST_JOB = 'mail-due-digest';

const DAY_MS = 24 * 60 * 60 * 1000;

export interface DueMaster {
  code: string;
  description: string;
  dueOn: string;
  /** Days from today to the due date; negative when overdue. */
  daysLeft: number;
}

export const digestSubject = (today: string) => `Masters due for calibration (${today})`;

function whenDue(daysLeft: number): string {
  if (daysLeft === 0) return 'due today';
  const days = (n: number) => `${n} day${n === 1 ? '' : 's'}`;
  return daysLeft > 0 ? `${days(daysLeft)} left` : `${days(-daysLeft)} overdue`;
}

export function digestBody(name: string, today: string, due: DueMaster[]): string {
  return [
    `Hello ${name},`,
    '',
    `These masters are overdue for calibration or due within ${DIGEST_WINDOW_DAYS} days (as of ${today}):`,
    '',
    ...due.map((m) => `- ${m.code}: ${m.description}, due ${m.dueOn} (${whenDue(m.daysLeft)})`),
    '',
    'An overdue master cannot be used to zero an inspection until it is calibrated again.',
  ].join('\n');
}

/**
 * Each morning, every active engineer gets one message listing the masters that need calibrating
 * soon. Nothing due, no message; run twice on one day, the second run sends nothing.
 */
@Injectable()
export class DueDigestService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(DueDigestService.name);
  private job: CronJob | null = null;

  constructor(
    private readonly em: EntityManager,
    private readonly mail: MailService,
    private readonly config: AppConfig,
    private readonly scheduler: SchedulerRegistry,
  ) {}

  onApplicationBootstrap(): void {
    const cronTime = this.config.get('MAIL_DIGEST_CRON');
    this.job = CronJob.from({
      cronTime,
      onTick: () => this.runScheduled(),
      start: true,
    });
    this.scheduler.addCronJob(DIGEST_JOB, this.job);
  }

  onApplicationShutdown(): void {
    void this.job?.stop();
  }

  private async runScheduled(): Promise<void> {
    try {
      const sent = await this.sendDueDigest();
      if (sent.length) this.logger.log(`Calibration digest: ${sent.length} message(s)`);
    } catch (error) {
      this.logger.error(`Calibration digest failed: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  /** Masters not retired whose calibration in force is overdue or due within the window, soonest first. */
  async dueMasters(today: string = todayIso()): Promise<DueMaster[]> {
    const masters = await this.em
      .fork()
      .find(
        MasterGauge,
        { retiredAt: null, currentCalibration: { dueOn: { $lte: addDays(today, DIGEST_WINDOW_DAYS) } } },
        { populate: ['currentCalibration'], orderBy: { currentCalibration: { dueOn: 'asc' }, code: 'asc' } },
      );
    return masters.flatMap((master) => {
      const dueOn = master.currentCalibration?.dueOn;
      if (!dueOn) return [];
      const daysLeft = Math.round((Date.parse(`${dueOn}T00:00:00Z`) - Date.parse(`${today}T00:00:00Z`)) / DAY_MS);
      return [{ code: master.code, description: master.description, dueOn, daysLeft }];
    });
  }

  /** Sends today's digest to each active engineer who has not had it yet today. */
  async sendDueDigest(today: string = todayIso()): Promise<MailDelivery[]> {
    const due = await this.dueMasters(today);
    if (!due.length) return [];
    const em = this.em.fork();
    const engineers = await em.find(
      User,
      { active: true, roles: { $contains: ['engineer'] } },
      { orderBy: { email: 'asc' } },
    );
    const subject = digestSubject(today);
    const deliveries: MailDelivery[] = [];
    for (const engineer of engineers) {
      // Already recorded today (sent or not): a failed one is retried from the Outbox, not resent here.
      if (await em.count(MailMessage, { kind: 'digest', subjectId: engineer.id, subject })) continue;
      deliveries.push(
        await this.mail.send(
          {
            kind: 'digest',
            recipient: engineer.email,
            subject,
            subjectId: engineer.id,
            body: digestBody(engineer.displayName, today, due),
          },
          null,
        ),
      );
    }
    return deliveries;
  }
}
