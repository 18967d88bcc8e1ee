import { Entity, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';

/** A buyer of matched sets. */
@Entity({ tableName: 'customer' })
export class Customer extends BaseEntity {
  @Property({ type: 'text' })
  @Unique()
  name!: string;

  @Property({ type: 'text' })
  contactEmail!: string;

  @Property({ type: 'text', nullable: true })
  notes: string | null = null;

  @Property({ type: 'uuid', nullable: true })
  createdById: string | null = null;
}
