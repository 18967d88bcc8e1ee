import { Check, Entity, Index, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';

export type MailKind = 'certificate' | 'password-reset' | 'digest';

/**
 * A message the product wants sent. Permanent; each try to hand it to the SMTP server is a
 * `MailAttempt`, so a failure stays on record with its reason and a retry is a new attempt.
 */
@Entity({ tableName: 'mail_message' })
@Check({ name: 'mail_message_kind_check', expression: `kind in ('certificate', 'password-reset', 'digest')` })
@Index({ properties: ['createdAt'] })
export class MailMessage extends BaseEntity {
  @Property({ type: 'text' })
  kind!: MailKind;

  @Property({ type: 'text' })
  recipient!: string;

  @Property({ type: 'text' })
  subject!: string;

  @Property({ type: 'text' })
  body!: string;

  /** What the message is about (a certificate's id, a user's id), for finding it again. */
  @Property({ type: 'uuid', nullable: true })
  @Index()
  subjectId: string | null = null;

  @Property({ type: 'uuid', nullable: true })
  requestedById: string | null = null;
}
