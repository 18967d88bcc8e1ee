import {
  customerDetailSchema,
  customerSchema,
  orderSchema,
  pageOf,
  type CreateCustomerInput,
  type CreateOrderInput,
  type Customer,
  type CustomerDetail,
  type ListQuery,
  type Order,
  type Page,
} from '@evenset/contracts';
import { apiWrite } from '../../../lib/api-client';
import { apiKey, useApi, useRevalidateUnder } from '../../../lib/swr';

export const CUSTOMERS_PATH = '/customers';

/** Who may add customers and orders, as the API's write routes declare it. */
export const CUSTOMER_WRITE_ROLES = ['sales', 'admin'] as const;
const customersPageSchema = pageOf(customerSchema);

export function useCustomers(query: ListQuery) {
  return useApi<Page<Customer>>(apiKey(CUSTOMERS_PATH, customersPageSchema, query), { keepPreviousData: true });
}

/** The customer with every order and the sets sent under it; `null` waits. */
export function useCustomer(customerId: string | null) {
  return useApi<CustomerDetail>(
    customerId ? apiKey(`${CUSTOMERS_PATH}/${encodeURIComponent(customerId)}`, customerDetailSchema) : null,
  );
}

/** After a customer, an order or a set changes, customer lists and pages are stale. */
export function useRevalidateCustomers(): () => Promise<unknown> {
  return useRevalidateUnder(CUSTOMERS_PATH);
}

export function createCustomer(input: CreateCustomerInput): Promise<Customer> {
  return apiWrite('POST', CUSTOMERS_PATH, input, customerSchema);
}

export function createOrder(customerId: string, input: CreateOrderInput): Promise<Order> {
  return apiWrite('POST', `${CUSTOMERS_PATH}/${encodeURIComponent(customerId)}/orders`, input, orderSchema);
}
