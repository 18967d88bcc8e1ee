import { Entity, Index, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';

/** One change made by one person. Append-only: never updated or deleted. */
@Entity({ tableName: 'audit_entry' })
@Index({ properties: ['subjectType', 'subjectId'] })
export class AuditEntry extends BaseEntity {
  @Property({ type: 'uuid', nullable: true })
  actorId?: string;

  @Property({ type: 'text' })
  actorName!: string;

  /** What was done, as `domain.verb`, e.g. `user.create`. */
  @Property({ type: 'text' })
  @Index()
  action!: string;

  @Property({ type: 'text' })
  subjectType!: string;

  @Property({ type: 'text' })
  subjectId!: string;

  @Property({ type: 'jsonb', nullable: true })
  before?: Record<string, unknown>;

  @Property({ type: 'jsonb', nullable: true })
  after?: Record<string, unknown>;

  @Property({ type: 'text', nullable: true })
  reason?: string;
}
