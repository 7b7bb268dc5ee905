import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { Roles } from '../common/roles';
import { CustomersService } from './customers.service';
import {
  CreateCustomerDto,
  CustomerPage,
  CustomerResponse,
  ListCustomersQuery,
  UpdateCustomerDto,
} from './dto/customer.dto';

const ID = new ParseUUIDPipe({ errorHttpStatusCode: 404 });

@ApiTags('customers')
@ApiBearerAuth()
@Controller('customers')
@Roles('owner', 'estimator')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListCustomersQuery): Promise<CustomerPage> {
    return this.customers.list(user.companyId, query);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateCustomerDto): Promise<CustomerResponse> {
    return this.customers.create(user.companyId, dto);
  }

  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<CustomerResponse> {
    return this.customers.get(user.companyId, id);
  }

  @Patch(':id')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: UpdateCustomerDto,
  ): Promise<CustomerResponse> {
    return this.customers.update(user.companyId, id, dto);
  }
}
