import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Lot } from './lot.entity';

/** One serialised part. A serial is unique within its part number, whatever the lot. */
@Entity({ tableName: 'part' })
@Unique({ properties: ['partNumber', 'serial'] })
export class Part extends BaseEntity {
  @ManyToOne(() => Lot)
  @Index()
  lot!: Lot;

  /** The lot's part number, kept here so the database itself keeps serials unique per part number. */
  @Property({ type: 'text' })
  partNumber!: string;

  @Property({ type: 'text' })
  serial!: string;
}
