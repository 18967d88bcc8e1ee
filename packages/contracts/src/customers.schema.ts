import { z } from 'zod';
import { listQuerySchema } from './list.schema';

/*
 * Customers and their orders.
 *
 * Routes (roles):
 * - GET  /api/customers               sales, service, engineer, admin  `customerListQuerySchema` → Page<Customer>
 * - POST /api/customers               sales, admin                     `createCustomerSchema` → Customer
 * - GET  /api/customers/:id           sales, service, engineer, admin  → CustomerDetail (orders with their sets)
 * - POST /api/customers/:id/orders    sales, admin                     `createOrderSchema` → Order
 */

const text = (what: string, max: number) =>
  z
    .string({ error: `Enter ${what}.` })
    .trim()
    .min(1, `Enter ${what}.`)
    .max(max, `${what[0]?.toUpperCase()}${what.slice(1)} can be at most ${max} characters.`);

export const createCustomerSchema = z.object({
  name: text('the customer name', 200),
  contactEmail: z.email({ error: 'Enter the contact e-mail address, like buyer@example.com.' }),
  notes: z.string().max(2000, 'Notes can be at most 2000 characters.').optional(),
});
export type CreateCustomerInput = z.infer<typeof createCustomerSchema>;

export const customerSchema = z.object({
  id: z.string(),
  name: z.string(),
  contactEmail: z.string(),
  notes: z.string().nullable(),
  orderCount: z.number().int(),
  setCount: z.number().int(),
  createdAt: z.string(),
});
export type Customer = z.infer<typeof customerSchema>;

export const customerListQuerySchema = listQuerySchema;
export type CustomerListQuery = z.infer<typeof customerListQuerySchema>;

export const createOrderSchema = z.object({
  reference: text('the order reference', 100),
  notes: z.string().max(2000, 'Notes can be at most 2000 characters.').optional(),
});
export type CreateOrderInput = z.infer<typeof createOrderSchema>;

export const orderSchema = z.object({
  id: z.string(),
  customerId: z.string(),
  customerName: z.string(),
  reference: z.string(),
  notes: z.string().nullable(),
  createdAt: z.string(),
});
export type Order = z.infer<typeof orderSchema>;

/** A set as listed under its order. */
export const orderSetSchema = z.object({
  id: z.string(),
  setNumber: z.string(),
  kind: z.enum(['set', 'replacement']),
  partNumber: z.string(),
  serials: z.array(z.string()),
  createdAt: z.string(),
});
export type OrderSet = z.infer<typeof orderSetSchema>;

export const customerDetailSchema = customerSchema.extend({
  orders: z.array(orderSchema.extend({ sets: z.array(orderSetSchema) })),
});
export type CustomerDetail = z.infer<typeof customerDetailSchema>;
