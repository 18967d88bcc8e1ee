import { Entity, Index, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';

/**
 * A message received by the local SMTP sink that `npm start` and the tests run instead of a real
 * mail server: the raw MIME as it arrived, parsed when shown on the Outbox page.
 */
@Entity({ tableName: 'captured_mail' })
@Index({ properties: ['createdAt'] })
export class CapturedMail extends BaseEntity {
  @Property({ type: 'text' })
  envelopeFrom!: string;

  @Property({ type: 'text[]' })
  envelopeTo: string[] = [];

  @Property({ type: 'text' })
  subject!: string;

  @Property({ type: 'blob', lazy: true })
  raw!: Buffer;
}
