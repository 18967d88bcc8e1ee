import { randomUUID } from 'node:crypto';
import { PrimaryKey, Property } from '@mikro-orm/core';

/** Every table: a UUID known before the insert (so audit entries can name it) and when it was written. */
export abstract class BaseEntity {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'timestamptz', defaultRaw: 'now()' })
  createdAt: Date = new Date();
}
