import { createCustomerSchema, createOrderSchema, customerListQuerySchema } from '@evenset/contracts';
import { createZodDto } from 'nestjs-zod';
import { z } from 'zod';

export class CreateCustomerDto extends createZodDto(createCustomerSchema) {}
export class CreateOrderDto extends createZodDto(createOrderSchema) {}
export class CustomerListQueryDto extends createZodDto(customerListQuerySchema) {}
export class CustomerIdDto extends createZodDto(
  z.object({ id: z.uuid({ error: 'This is not a valid customer id.' }) }),
) {}
