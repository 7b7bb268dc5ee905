import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiHeader, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import {
  ApproveCountDto,
  CountEntriesDto,
  CountResponse,
  CountsQueryDto,
  CountSummaryResponse,
  OpenCountDto,
  RejectCountDto,
  SubmitCountDto,
} from './dto/count.dto';
import { CountsService } from './counts.service';
import { IdempotencyKey } from './idempotency-key.decorator';

const id404 = new ParseUUIDPipe({ errorHttpStatusCode: 404 });
const KEY_HEADER = { name: 'Idempotency-Key', required: false, description: 'the same key retries the same request without doing it twice' };

@ApiTags('stock')
@ApiBearerAuth()
@Controller('stock-counts')
export class CountsController {
  constructor(private readonly counts: CountsService) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Query() q: CountsQueryDto): Promise<CountSummaryResponse[]> {
    return this.counts.list(user, q);
  }

  @Get(':id')
  @Roles(...ANY_ROLE)
  get(@CurrentUser() user: AuthUser, @Param('id', id404) id: string): Promise<CountResponse> {
    return this.counts.get(user, id);
  }

  @Post()
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  open(@CurrentUser() user: AuthUser, @Body() dto: OpenCountDto, @IdempotencyKey() key?: string): Promise<CountResponse> {
    return this.counts.open(user, dto, key);
  }

  @Patch(':id')
  @Roles('owner', 'storeman')
  enter(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: CountEntriesDto): Promise<CountResponse> {
    return this.counts.enter(user, id, dto);
  }

  @Post(':id/submit')
  @HttpCode(200)
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  submit(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: SubmitCountDto, @IdempotencyKey() key?: string): Promise<CountResponse> {
    return this.counts.submit(user, id, dto, key);
  }

  @Post(':id/approve')
  @HttpCode(200)
  @Roles('owner')
  @ApiHeader(KEY_HEADER)
  approve(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: ApproveCountDto, @IdempotencyKey() key?: string): Promise<CountResponse> {
    return this.counts.approve(user, id, dto, key);
  }

  @Post(':id/reject')
  @HttpCode(200)
  @Roles('owner')
  @ApiHeader(KEY_HEADER)
  reject(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: RejectCountDto, @IdempotencyKey() key?: string): Promise<CountResponse> {
    return this.counts.reject(user, id, dto, key);
  }
}
