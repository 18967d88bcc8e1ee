import { Entity, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { MailMessage } from './mail-message.entity';

/** A file attached to an outgoing message, kept so that a retry sends the same bytes. */
@Entity({ tableName: 'mail_attachment' })
export class MailAttachment extends BaseEntity {
  @ManyToOne(() => MailMessage)
  message!: MailMessage;

  @Property({ type: 'text' })
  filename!: string;

  @Property({ type: 'text' })
  contentType!: string;

  @Property({ type: 'blob', lazy: true })
  content!: Buffer;
}
