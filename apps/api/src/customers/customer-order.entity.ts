import { Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Customer } from './customer.entity';

/** A customer's order, by the reference the customer gave it. */
@Entity({ tableName: 'customer_order' })
@Unique({ properties: ['customer', 'reference'] })
export class CustomerOrder extends BaseEntity {
  @ManyToOne(() => Customer, { eager: true })
  customer!: Customer;

  @Property({ type: 'text' })
  reference!: string;

  @Property({ type: 'text', nullable: true })
  notes: string | null = null;

  @Property({ type: 'uuid', nullable: true })
  createdById: string | null = null;
}
