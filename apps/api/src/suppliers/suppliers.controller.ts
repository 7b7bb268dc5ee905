import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { ImportQuery } from '../catalogue/dto/import.dto';
import { today } from '../catalogue/dto/validators';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import {
  CreatePriceDto,
  ImportPricesDto,
  MaterialPricesQuery,
  MaterialPricesResponse,
  PriceExportQuery,
  PriceImportResult,
  SupplierPriceListQuery,
  SupplierPricePage,
  SupplierPriceResponse,
} from './dto/price.dto';
import {
  ContactResponse,
  CreateContactDto,
  CreateSupplierDto,
  SupplierListQuery,
  SupplierPage,
  SupplierResponse,
  UpdateContactDto,
  UpdateSupplierDto,
} from './dto/supplier.dto';
import { SupplierPricesService } from './supplier-prices.service';
import { SuppliersService } from './suppliers.service';

const Id = (name: string) => Param(name, new ParseUUIDPipe({ errorHttpStatusCode: 404 }));

/** Suppliers, contacts and price lists: owner and estimator edit, everyone reads. */
@ApiTags('suppliers')
@ApiBearerAuth()
@Controller('suppliers')
export class SuppliersController {
  constructor(
    private readonly suppliers: SuppliersService,
    private readonly prices: SupplierPricesService,
  ) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Query() query: SupplierListQuery): Promise<SupplierPage> {
    return this.suppliers.list(user.companyId, query);
  }

  @Post()
  @Roles('owner', 'estimator')
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateSupplierDto): Promise<SupplierResponse> {
    return this.suppliers.create(user, dto);
  }

  @Get(':id')
  @Roles(...ANY_ROLE)
  get(@CurrentUser() user: AuthUser, @Id('id') id: string): Promise<SupplierResponse> {
    return this.suppliers.get(user.companyId, id);
  }

  @Patch(':id')
  @Roles('owner', 'estimator')
  update(@CurrentUser() user: AuthUser, @Id('id') id: string, @Body() dto: UpdateSupplierDto): Promise<SupplierResponse> {
    return this.suppliers.update(user, id, dto);
  }

  @Post(':id/contacts')
  @Roles('owner', 'estimator')
  addContact(@CurrentUser() user: AuthUser, @Id('id') id: string, @Body() dto: CreateContactDto): Promise<ContactResponse> {
    return this.suppliers.addContact(user, id, dto);
  }

  @Patch(':id/contacts/:contactId')
  @Roles('owner', 'estimator')
  updateContact(
    @CurrentUser() user: AuthUser,
    @Id('id') id: string,
    @Id('contactId') contactId: string,
    @Body() dto: UpdateContactDto,
  ): Promise<ContactResponse> {
    return this.suppliers.updateContact(user, id, contactId, dto);
  }

  @Delete(':id/contacts/:contactId')
  @HttpCode(204)
  @Roles('owner', 'estimator')
  deleteContact(@CurrentUser() user: AuthUser, @Id('id') id: string, @Id('contactId') contactId: string): Promise<void> {
    return this.suppliers.deleteContact(user, id, contactId);
  }

  @Get(':id/prices')
  @Roles(...ANY_ROLE)
  listPrices(@CurrentUser() user: AuthUser, @Id('id') id: string, @Query() query: SupplierPriceListQuery): Promise<SupplierPricePage> {
    return this.prices.listForSupplier(user.companyId, id, query);
  }

  @Post(':id/prices')
  @Roles('owner', 'estimator')
  addPrice(@CurrentUser() user: AuthUser, @Id('id') id: string, @Body() dto: CreatePriceDto): Promise<SupplierPriceResponse> {
    return this.prices.create(user, id, dto);
  }

  @Get(':id/prices/export.csv')
  @Roles(...ANY_ROLE)
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: 'The prices in force on `on` (default today) as a price list CSV' })
  async exportPrices(
    @CurrentUser() user: AuthUser,
    @Id('id') id: string,
    @Query() query: PriceExportQuery,
    @Res({ passthrough: true }) res: Response,
  ): Promise<string> {
    const { csv, supplierName } = await this.prices.exportCsv(user.companyId, id, query.on);
    const slug = supplierName.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'supplier';
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="prices-${slug}-${query.on ?? today()}.csv"`);
    return csv;
  }

  @Post(':id/prices/import')
  @HttpCode(200)
  @Roles('owner', 'estimator')
  importPrices(
    @CurrentUser() user: AuthUser,
    @Id('id') id: string,
    @Query() query: ImportQuery,
    @Body() dto: ImportPricesDto,
  ): Promise<PriceImportResult> {
    return this.prices.importCsv(user, id, dto.csv, query.mode, dto.validFrom ?? null);
  }
}

/** `GET /api/materials/{id}/prices`: every supplier's price for one material. */
@ApiTags('suppliers')
@ApiBearerAuth()
@Controller('materials')
export class MaterialPricesController {
  constructor(private readonly prices: SupplierPricesService) {}

  @Get(':id/prices')
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Id('id') id: string, @Query() query: MaterialPricesQuery): Promise<MaterialPricesResponse> {
    return this.prices.listForMaterial(user.companyId, id, query);
  }
}
