import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { StockBalancesResponse, StockOverviewResponse, StockQueryDto } from './dto/stock.dto';
import { StockService } from './stock.service';

@ApiTags('stock')
@ApiBearerAuth()
@Controller('stock')
export class StockController {
  constructor(private readonly stock: StockService) {}

  @Get()
  @Roles(...ANY_ROLE)
  balances(@CurrentUser() user: AuthUser, @Query() q: StockQueryDto): Promise<StockBalancesResponse> {
    return this.stock.balances(user.companyId, q);
  }

  @Get('overview')
  @Roles(...ANY_ROLE)
  overview(@CurrentUser() user: AuthUser): Promise<StockOverviewResponse> {
    return this.stock.overview(user.companyId);
  }
}
