import { Body, Controller, Get, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiHeader, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { CreateMovementDto, MovementPageResponse, MovementResultResponse, MovementsQueryDto, ReverseMovementDto } from './dto/movement.dto';
import { IdempotencyKey } from './idempotency-key.decorator';
import { StockService } from './stock.service';

const id404 = new ParseUUIDPipe({ errorHttpStatusCode: 404 });
const KEY_HEADER = { name: 'Idempotency-Key', required: false, description: 'the same key retries the same request without doing it twice' };

@ApiTags('stock')
@ApiBearerAuth()
@Controller('stock-movements')
export class MovementsController {
  constructor(private readonly stock: StockService) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Query() q: MovementsQueryDto): Promise<MovementPageResponse> {
    return this.stock.listMovements(user.companyId, q);
  }

  @Post()
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateMovementDto, @IdempotencyKey() key?: string): Promise<MovementResultResponse> {
    return this.stock.post(user, dto, key);
  }

  @Post(':id/reverse')
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  reverse(
    @CurrentUser() user: AuthUser,
    @Param('id', id404) id: string,
    @Body() dto: ReverseMovementDto,
    @IdempotencyKey() key?: string,
  ): Promise<MovementResultResponse> {
    return this.stock.reverse(user, id, dto, key);
  }
}
