import { Body, Controller, Get, Param, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Customer, CustomerDetail, Order, Page, SessionUser } from '@evenset/contracts';
import { Roles } from '../common/auth/access.decorators';
import { CurrentUser } from '../common/auth/current-user.decorator';
import { CreateCustomerDto, CreateOrderDto, CustomerIdDto, CustomerListQueryDto } from './customers.dto';
import { CustomersService } from './customers.service';

/** Who may look customers up: sales and service work with them, engineers see whom sets went to. */
const READERS = ['sales', 'service', 'engineer', 'admin'] as const;

@ApiTags('customers')
@Controller('customers')
@Roles('sales', 'admin')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  @Get()
  @Roles(...READERS)
  list(@Query() query: CustomerListQueryDto): Promise<Page<Customer>> {
    return this.customers.list(query);
  }

  @Post()
  create(@CurrentUser() actor: SessionUser, @Body() body: CreateCustomerDto): Promise<Customer> {
    return this.customers.create(actor, body);
  }

  /** The customer with every order and the sets sent under it. */
  @Get(':id')
  @Roles(...READERS)
  detail(@Param() { id }: CustomerIdDto): Promise<CustomerDetail> {
    return this.customers.detail(id);
  }

  @Post(':id/orders')
  createOrder(
    @CurrentUser() actor: SessionUser,
    @Param() { id }: CustomerIdDto,
    @Body() body: CreateOrderDto,
  ): Promise<Order> {
    return this.customers.createOrder(actor, id, body);
  }
}
