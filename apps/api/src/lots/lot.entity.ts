import { Check, Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Spec } from '../specs/spec.entity';

/** A lot of ground parts made to one released spec revision. */
@Entity({ tableName: 'lot' })
@Check({ name: 'lot_quantity_check', expression: 'quantity >= 1' })
export class Lot extends BaseEntity {
  @Property({ type: 'text' })
  @Unique()
  lotNumber!: string;

  @ManyToOne(() => Spec, { eager: true })
  spec!: Spec;

  @Property({ type: 'integer' })
  quantity!: number;

  @Property({ type: 'date' })
  grindDate!: string;

  @Property({ type: 'text', nullable: true })
  notes: string | null = null;

  @Property({ type: 'uuid', nullable: true })
  createdById: string | null = null;
}
