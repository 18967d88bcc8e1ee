import { EntityManager } from '@mikro-orm/postgresql';
import { QueryOrder } from '@mikro-orm/core';
import { Injectable } from '@nestjs/common';
import type {
  CapturedMail as CapturedMailView,
  CapturedMailDetail,
  OutboxListQuery,
  OutboxMessage,
  Page,
} from '@evenset/contracts';
import { simpleParser, type AddressObject, type ParsedMail } from 'mailparser';
import { NotFoundException } from '../common/errors/domain.exception';
import { searchAny } from '../common/list-query';
import { CapturedMail } from './captured-mail.entity';
import { MailAttachment } from './mail-attachment.entity';
import { MailAttempt } from './mail-attempt.entity';
import { MailMessage } from './mail-message.entity';

export interface CapturedFile {
  filename: string;
  contentType: string;
  content: Buffer;
}

const addresses = (value: AddressObject | AddressObject[] | undefined): string[] =>
  (Array.isArray(value) ? value : value ? [value] : []).flatMap((group) =>
    group.value.map((a) => (a.name ? `${a.name} <${a.address ?? ''}>` : (a.address ?? ''))),
  );

const fileName = (name: string | undefined, index: number) => name || `attachment-${index + 1}`;

/** What the Outbox page shows: Evenset's own messages with their attempts, and what the local catcher received. */
@Injectable()
export class OutboxService {
  constructor(private readonly em: EntityManager) {}

  async messages(query: OutboxListQuery): Promise<Page<OutboxMessage>> {
    const [messages, total] = await this.em.findAndCount(
      MailMessage,
      searchAny<MailMessage>(query.q, ['recipient', 'subject']),
      {
        orderBy: [{ createdAt: QueryOrder.DESC }, { id: QueryOrder.DESC }],
        limit: query.pageSize,
        offset: query.page * query.pageSize,
      },
    );
    const ids = messages.map((m) => m.id);
    const [attempts, files] = ids.length
      ? await Promise.all([
          this.em.find(MailAttempt, { message: { $in: ids } }, { orderBy: { createdAt: 'asc', id: 'asc' } }),
          this.em.find(MailAttachment, { message: { $in: ids } }, { orderBy: { createdAt: 'asc', id: 'asc' } }),
        ])
      : [[], []];
    return {
      total,
      items: messages.map((message) => {
        const tries = attempts.filter((a) => a.message.id === message.id);
        const last = tries.at(-1);
        return {
          id: message.id,
          kind: message.kind,
          recipient: message.recipient,
          subject: message.subject,
          createdAt: message.createdAt.toISOString(),
          // A message whose first attempt has not been written yet has not gone out either.
          status: last?.outcome ?? 'failed',
          lastError: last ? last.error : 'Not tried yet.',
          lastAttemptAt: last?.createdAt.toISOString() ?? null,
          attempts: tries.length,
          attachments: files.filter((f) => f.message.id === message.id).map((f) => f.filename),
        };
      }),
    };
  }

  async captured(query: OutboxListQuery): Promise<Page<CapturedMailView>> {
    const [mails, total] = await this.em.findAndCount(CapturedMail, searchAny<CapturedMail>(query.q, ['subject']), {
      orderBy: [{ createdAt: QueryOrder.DESC }, { id: QueryOrder.DESC }],
      limit: query.pageSize,
      offset: query.page * query.pageSize,
      populate: ['raw'],
    });
    const items = await Promise.all(mails.map(async (mail) => summary(mail, await parse(mail))));
    return { items, total };
  }

  async capturedDetail(id: string): Promise<CapturedMailDetail> {
    const mail = await this.load(id);
    const parsed = await parse(mail);
    return { ...summary(mail, parsed), text: parsed.text ?? '' };
  }

  async capturedAttachment(id: string, index: number): Promise<CapturedFile> {
    const parsed = await parse(await this.load(id));
    const file = parsed.attachments[index];
    if (!file) throw new NotFoundException('This attachment');
    return { filename: fileName(file.filename, index), contentType: file.contentType, content: file.content };
  }

  private async load(id: string): Promise<CapturedMail> {
    const mail = await this.em.findOne(CapturedMail, { id }, { populate: ['raw'] });
    if (!mail) throw new NotFoundException('This received message');
    return mail;
  }
}

function parse(mail: CapturedMail): Promise<ParsedMail> {
  return simpleParser(mail.raw, { skipHtmlToText: false, skipTextToHtml: true, skipTextLinks: true });
}

function summary(mail: CapturedMail, parsed: ParsedMail): CapturedMailView {
  return {
    id: mail.id,
    receivedAt: mail.createdAt.toISOString(),
    from: addresses(parsed.from)[0] ?? mail.envelopeFrom,
    to: addresses(parsed.to).length ? addresses(parsed.to) : mail.envelopeTo,
    subject: parsed.subject ?? mail.subject,
    date: parsed.date?.toISOString() ?? null,
    attachments: parsed.attachments.map((file, index) => ({
      filename: fileName(file.filename, index),
      contentType: file.contentType,
      size: file.size,
    })),
  };
}
