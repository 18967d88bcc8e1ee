import { Check, Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { MailMessage } from './mail-message.entity';

/** One try to hand a message to the SMTP server: sent (with the server's answer) or failed (why). */
@Entity({ tableName: 'mail_attempt' })
@Check({
  name: 'mail_attempt_outcome_check',
  expression: `outcome in ('sent', 'failed') and ((outcome = 'failed') = (error is not null))`,
})
@Index({ properties: ['message', 'createdAt'] })
export class MailAttempt extends BaseEntity {
  @ManyToOne(() => MailMessage)
  message!: MailMessage;

  @Property({ type: 'text' })
  outcome!: 'sent' | 'failed';

  @Property({ type: 'text', nullable: true })
  error: string | null = null;

  @Property({ type: 'text', nullable: true })
  serverResponse: string | null = null;
}
