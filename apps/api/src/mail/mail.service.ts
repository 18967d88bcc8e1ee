import { randomUUID } from 'node:crypto';
import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, Logger } from '@nestjs/common';
import { createTransport } from 'nodemailer';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { AppConfig } from '../config/app-config.service';
import { MailAttachment } from './mail-attachment.entity';
import { MailAttempt } from './mail-attempt.entity';
import { MailMessage, type MailKind } from './mail-message.entity';
import { describeSendFailure, NO_MAIL_SERVER } from './send-failure';

export interface OutgoingMail {
  kind: MailKind;
  recipient: string;
  subject: string;
  body: string;
  subjectId?: string | null;
  attachments?: { filename: string; contentType: string; content: Buffer }[];
}

export interface MailDelivery {
  messageId: string;
  status: 'sent' | 'failed';
  error: string | null;
}

export type MailActor = { id: string; displayName: string } | null;

/** Short limits so a dead or silent mail server turns into a failed attempt, not a hung request. */
const CONNECTION_TIMEOUT_MS = 4000;
const GREETING_TIMEOUT_MS = 4000;
const SOCKET_TIMEOUT_MS = 10000;

/**
 * Records every outgoing message before trying to send it, then records each try. Works in its own
 * forked entity manager so a caller's unsaved changes are never flushed by mail, and so it can run
 * outside an HTTP request (the daily digest).
 */
@Injectable()
export class MailService {
  private readonly logger = new Logger(MailService.name);

  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly config: AppConfig,
  ) {}

  async send(mail: OutgoingMail, actor: MailActor): Promise<MailDelivery> {
    const em = this.em.fork();
    const message = await em.transactional(async (tx) => {
      const created = tx.create(MailMessage, {
        kind: mail.kind,
        recipient: mail.recipient,
        subject: mail.subject,
        body: mail.body,
        subjectId: mail.subjectId ?? null,
        requestedById: actor?.id ?? null,
        createdAt: new Date(),
      });
      tx.persist(created);
      for (const file of mail.attachments ?? []) {
        tx.persist(
          tx.create(MailAttachment, {
            message: created,
            filename: file.filename,
            contentType: file.contentType,
            content: file.content,
            createdAt: new Date(),
          }),
        );
      }
      await tx.flush();
      await this.audit.recordMany(tx, actor, [
        {
          action: 'mail.send',
          subjectType: 'mail_message',
          subjectId: created.id,
          after: {
            kind: mail.kind,
            recipient: mail.recipient,
            subject: mail.subject,
            subjectId: mail.subjectId ?? null,
            attachments: (mail.attachments ?? []).map((file) => file.filename),
          },
        },
      ]);
      return created;
    });
    return this.attempt(em, message.id, mail);
  }

  /** Tries again with exactly the recorded message and attachment bytes; a new attempt either way. */
  async retry(messageId: string, actor: MailActor): Promise<MailDelivery> {
    const em = this.em.fork();
    const message = await em.findOne(MailMessage, { id: messageId });
    if (!message) throw new NotFoundException('The message');
    const files = await em.find(
      MailAttachment,
      { message: message.id },
      { populate: ['content'], orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    await em.transactional(async (tx) => {
      await this.audit.recordMany(tx, actor, [
        {
          action: 'mail.retry',
          subjectType: 'mail_message',
          subjectId: message.id,
          after: { recipient: message.recipient, subject: message.subject },
        },
      ]);
    });
    return this.attempt(em, message.id, {
      kind: message.kind,
      recipient: message.recipient,
      subject: message.subject,
      body: message.body,
      attachments: files.map((file) => ({
        filename: file.filename,
        contentType: file.contentType,
        content: file.content,
      })),
    });
  }

  private async attempt(em: EntityManager, messageId: string, mail: OutgoingMail): Promise<MailDelivery> {
    const outcome = await this.deliver(mail);
    await em.insert(MailAttempt, {
      id: randomUUID(),
      message: messageId,
      outcome: outcome.error === null ? 'sent' : 'failed',
      error: outcome.error,
      serverResponse: outcome.response,
      createdAt: new Date(),
    });
    if (outcome.error !== null) this.logger.warn(`Mail ${messageId} not sent: ${outcome.error}`);
    return { messageId, status: outcome.error === null ? 'sent' : 'failed', error: outcome.error };
  }

  private async deliver(mail: OutgoingMail): Promise<{ error: string | null; response: string | null }> {
    const url = this.config.get('SMTP_URL');
    if (!url) return { error: NO_MAIL_SERVER, response: null };
    const transport = createTransport({
      url,
      connectionTimeout: CONNECTION_TIMEOUT_MS,
      greetingTimeout: GREETING_TIMEOUT_MS,
      socketTimeout: SOCKET_TIMEOUT_MS,
    });
    try {
      const info = await transport.sendMail({
        from: this.config.get('MAIL_FROM'),
        to: mail.recipient,
        subject: mail.subject,
        text: mail.body,
        attachments: (mail.attachments ?? []).map((file) => ({
          filename: file.filename,
          contentType: file.contentType,
          content: file.content,
        })),
      });
      return { error: null, response: info.response || 'accepted' };
    } catch (error) {
      return { error: describeSendFailure(error, url), response: null };
    } finally {
      transport.close();
    }
  }
}
