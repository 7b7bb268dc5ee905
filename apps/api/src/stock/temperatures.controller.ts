import { Body, Controller, Get, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiHeader, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { CreateReadingDto, ImportReadingsDto, ImportReadingsResponse, ReadingsChartResponse, ReadingsQueryDto, RecordReadingResponse } from './dto/temperature.dto';
import { IdempotencyKey } from './idempotency-key.decorator';
import { TemperaturesService } from './temperatures.service';

const KEY_HEADER = { name: 'Idempotency-Key', required: false, description: 'the same key retries the same request without doing it twice' };

@ApiTags('stock')
@ApiBearerAuth()
@Controller('temperature-readings')
export class TemperaturesController {
  constructor(private readonly temperatures: TemperaturesService) {}

  @Get()
  @Roles(...ANY_ROLE)
  chart(@CurrentUser() user: AuthUser, @Query() q: ReadingsQueryDto): Promise<ReadingsChartResponse> {
    return this.temperatures.chart(user.companyId, q);
  }

  @Post()
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  record(@CurrentUser() user: AuthUser, @Body() dto: CreateReadingDto, @IdempotencyKey() key?: string): Promise<RecordReadingResponse> {
    return this.temperatures.record(user, dto, key);
  }

  @Post('import')
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  import(@CurrentUser() user: AuthUser, @Body() dto: ImportReadingsDto, @IdempotencyKey() key?: string): Promise<ImportReadingsResponse> {
    return this.temperatures.import(user, dto, key);
  }
}
