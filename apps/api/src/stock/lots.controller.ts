import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiHeader, ApiProduces, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { LabelQueryDto, LotActionDto, LotDetailResponse, LotResponse, LotsQueryDto } from './dto/lot.dto';
import { IdempotencyKey } from './idempotency-key.decorator';
import { LotsService } from './lots.service';

const id404 = new ParseUUIDPipe({ errorHttpStatusCode: 404 });
const KEY_HEADER = { name: 'Idempotency-Key', required: false, description: 'the same key retries the same request without doing it twice' };

@ApiTags('stock')
@ApiBearerAuth()
@Controller('lots')
export class LotsController {
  constructor(private readonly lots: LotsService) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Query() q: LotsQueryDto): Promise<LotResponse[]> {
    return this.lots.list(user.companyId, q);
  }

  @Get(':id')
  @Roles(...ANY_ROLE)
  get(@CurrentUser() user: AuthUser, @Param('id', id404) id: string): Promise<LotDetailResponse> {
    return this.lots.get(user.companyId, id);
  }

  @Get(':id/label.pdf')
  @Roles(...ANY_ROLE)
  @ApiProduces('application/pdf')
  async label(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Query() q: LabelQueryDto): Promise<StreamableFile> {
    const pdf = await this.lots.lotLabel(user.companyId, id, q.copies ?? 1);
    return new StreamableFile(pdf, { type: 'application/pdf', disposition: `inline; filename="lot-${id.slice(0, 8)}-label.pdf"` });
  }

  @Post(':id/quarantine')
  @HttpCode(200)
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  quarantine(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: LotActionDto, @IdempotencyKey() key?: string): Promise<LotDetailResponse> {
    return this.lots.act(user, id, 'quarantine', dto, key);
  }

  @Post(':id/release')
  @HttpCode(200)
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  release(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: LotActionDto, @IdempotencyKey() key?: string): Promise<LotDetailResponse> {
    return this.lots.act(user, id, 'release', dto, key);
  }

  @Post(':id/clear-flag')
  @HttpCode(200)
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  clearFlag(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: LotActionDto, @IdempotencyKey() key?: string): Promise<LotDetailResponse> {
    return this.lots.act(user, id, 'clear-flag', dto, key);
  }
}
