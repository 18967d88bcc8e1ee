import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type {
  CreateCustomerInput,
  CreateOrderInput,
  Customer as CustomerView,
  CustomerDetail,
  CustomerListQuery,
  Order as OrderView,
  Page,
  SessionUser,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { listOptions, searchAny } from '../common/list-query';
import { MatchedSet } from '../sets/matched-set.entity';
import { SetMember } from '../sets/set-member.entity';
import { CustomerOrder } from './customer-order.entity';
import { Customer } from './customer.entity';
import { CustomerNameTakenException, OrderReferenceTakenException } from './customers.exception';

@Injectable()
export class CustomersService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list(query: CustomerListQuery): Promise<Page<CustomerView>> {
    const [customers, total] = await this.em.findAndCount(
      Customer,
      searchAny<Customer>(query.q, ['name', 'contactEmail', 'notes']),
      listOptions(query, ['name', 'contactEmail', 'createdAt'], 'name'),
    );
    return { items: await this.views(customers), total };
  }

  async create(actor: SessionUser, input: CreateCustomerInput): Promise<CustomerView> {
    const customer = this.em.create(Customer, {
      name: input.name,
      contactEmail: input.contactEmail,
      notes: input.notes?.trim() || null,
      createdById: actor.id,
      createdAt: new Date(),
    });
    this.em.persist(customer);
    this.audit.record(actor, {
      action: 'customer.create',
      subjectType: 'customer',
      subjectId: customer.id,
      after: input,
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new CustomerNameTakenException(input.name);
      throw error;
    }
    return (await this.views([customer]))[0]!;
  }

  async detail(id: string): Promise<CustomerDetail> {
    const customer = await this.get(id);
    const orders = await this.em.find(CustomerOrder, { customer }, { orderBy: { createdAt: 'desc', id: 'asc' } });
    const sets = await this.em.find(MatchedSet, { order: { $in: orders } }, { orderBy: { setNumber: 'asc' } });
    const members = await this.em.find(SetMember, { set: { $in: sets } }, { orderBy: { position: 'asc' } });
    const serials = new Map<string, string[]>();
    for (const m of members) serials.set(m.set.id, [...(serials.get(m.set.id) ?? []), m.part.serial]);
    return {
      ...(await this.views([customer]))[0]!,
      orders: orders.map((order) => ({
        ...orderView(order),
        sets: sets
          .filter((s) => s.order.id === order.id)
          .map((s) => ({
            id: s.id,
            setNumber: s.setNumber,
            kind: s.kind,
            partNumber: s.partNumber,
            serials: serials.get(s.id) ?? [],
            createdAt: s.createdAt.toISOString(),
          })),
      })),
    };
  }

  async createOrder(actor: SessionUser, customerId: string, input: CreateOrderInput): Promise<OrderView> {
    const customer = await this.get(customerId);
    const order = this.em.create(CustomerOrder, {
      customer,
      reference: input.reference,
      notes: input.notes?.trim() || null,
      createdById: actor.id,
      createdAt: new Date(),
    });
    this.em.persist(order);
    this.audit.record(actor, {
      action: 'order.create',
      subjectType: 'customer_order',
      subjectId: order.id,
      after: input,
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new OrderReferenceTakenException(input.reference);
      throw error;
    }
    return orderView(order);
  }

  private async get(id: string): Promise<Customer> {
    const customer = await this.em.findOne(Customer, { id });
    if (!customer) throw new NotFoundException('The customer');
    return customer;
  }

  private async views(customers: Customer[]): Promise<CustomerView[]> {
    if (!customers.length) return [];
    const ids = customers.map((c) => c.id);
    const counts = await this.em.execute<{ customer_id: string; orders: string; sets: string }[]>(
      `select o.customer_id, count(distinct o.id) as orders, count(s.id) as sets
         from customer_order o left join matched_set s on s.order_id = o.id
        where o.customer_id in (?) group by o.customer_id`,
      [ids],
    );
    const byId = new Map(counts.map((c) => [c.customer_id, c]));
    return customers.map((c) => ({
      id: c.id,
      name: c.name,
      contactEmail: c.contactEmail,
      notes: c.notes,
      orderCount: Number(byId.get(c.id)?.orders ?? 0),
      setCount: Number(byId.get(c.id)?.sets ?? 0),
      createdAt: c.createdAt.toISOString(),
    }));
  }
}

export function orderView(order: CustomerOrder): OrderView {
  return {
    id: order.id,
    customerId: order.customer.id,
    customerName: order.customer.name,
    reference: order.reference,
    notes: order.notes,
    createdAt: order.createdAt.toISOString(),
  };
}
