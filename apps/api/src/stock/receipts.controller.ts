import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Req, StreamableFile, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiHeader, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { MB, UploadInterceptor } from '../files/upload.interceptor';
import { CreateReceiptDto, ReceiptPageResponse, ReceiptResponse, ReceiptsQueryDto } from './dto/receipt.dto';
import { IdempotencyKey } from './idempotency-key.decorator';
import { ReceiptsService } from './receipts.service';

const id404 = new ParseUUIDPipe({ errorHttpStatusCode: 404 });
const KEY_HEADER = { name: 'Idempotency-Key', required: false, description: 'the same key retries the same request without doing it twice' };
/** Delivery notes: at most 10 MB (issue 4). */
export const DELIVERY_NOTE_MAX_BYTES = 10 * MB;

@ApiTags('stock')
@ApiBearerAuth()
@Controller('receipts')
export class ReceiptsController {
  constructor(private readonly receipts: ReceiptsService) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Query() q: ReceiptsQueryDto): Promise<ReceiptPageResponse> {
    return this.receipts.list(user.companyId, q);
  }

  @Get(':id')
  @Roles(...ANY_ROLE)
  get(@CurrentUser() user: AuthUser, @Param('id', id404) id: string): Promise<ReceiptResponse> {
    return this.receipts.get(user.companyId, id);
  }

  @Post()
  @Roles('owner', 'storeman')
  @ApiHeader(KEY_HEADER)
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateReceiptDto, @IdempotencyKey() key?: string): Promise<ReceiptResponse> {
    return this.receipts.create(user, dto, key);
  }

  @Post(':id/delivery-note')
  @HttpCode(200)
  @Roles('owner', 'storeman')
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: { type: 'string', format: 'binary', description: 'PDF, JPEG or PNG, at most 10 MB' } } } })
  @UseInterceptors(UploadInterceptor('file', DELIVERY_NOTE_MAX_BYTES, 'The delivery note'))
  upload(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Req() req: Request): Promise<ReceiptResponse> {
    return this.receipts.attachDeliveryNote(user, id, req.file);
  }

  @Get(':id/delivery-note')
  @Roles(...ANY_ROLE)
  @ApiProduces('application/pdf', 'image/jpeg', 'image/png')
  async deliveryNote(@CurrentUser() user: AuthUser, @Param('id', id404) id: string): Promise<StreamableFile> {
    const f = await this.receipts.deliveryNote(user.companyId, id);
    return new StreamableFile(f.body, { type: f.file.contentType, disposition: `inline; filename="${f.downloadName}"`, length: f.body.length });
  }

  @Get(':id/labels.pdf')
  @Roles(...ANY_ROLE)
  @ApiProduces('application/pdf')
  async labels(@CurrentUser() user: AuthUser, @Param('id', id404) id: string): Promise<StreamableFile> {
    const { pdf, number } = await this.receipts.labels(user.companyId, id);
    return new StreamableFile(pdf, { type: 'application/pdf', disposition: `inline; filename="receipt-${number}-labels.pdf"` });
  }
}
