import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { CatalogueService } from './catalogue.service';
import { ImportMaterialsDto, ImportQuery, ImportResult } from './dto/import.dto';
import {
  CreateMaterialDto,
  MaterialFilterQuery,
  MaterialListQuery,
  MaterialPage,
  MaterialResponse,
  UpdateMaterialDto,
} from './dto/material.dto';
import { today } from './dto/validators';

/** The catalogue: owner and estimator edit, everyone reads. */
@ApiTags('catalogue')
@ApiBearerAuth()
@Controller('materials')
export class CatalogueController {
  constructor(private readonly catalogue: CatalogueService) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Query() query: MaterialListQuery): Promise<MaterialPage> {
    return this.catalogue.list(user.companyId, query);
  }

  @Post()
  @Roles('owner', 'estimator')
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateMaterialDto): Promise<MaterialResponse> {
    return this.catalogue.create(user, dto);
  }

  // Before ':id' so the words are not read as an id.
  @Get('export.csv')
  @Roles(...ANY_ROLE)
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: 'The catalogue as CSV (columns as the import reads them)' })
  async exportCsv(
    @CurrentUser() user: AuthUser,
    @Query() query: MaterialFilterQuery,
    @Res({ passthrough: true }) res: Response,
  ): Promise<string> {
    const csv = await this.catalogue.exportCsv(user.companyId, query);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="catalogue-${today()}.csv"`);
    return csv;
  }

  @Post('import')
  @HttpCode(200)
  @Roles('owner', 'estimator')
  importCsv(@CurrentUser() user: AuthUser, @Query() query: ImportQuery, @Body() dto: ImportMaterialsDto): Promise<ImportResult> {
    return this.catalogue.importCsv(user, dto.csv, query.mode);
  }

  @Get(':id')
  @Roles(...ANY_ROLE)
  get(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe({ errorHttpStatusCode: 404 })) id: string): Promise<MaterialResponse> {
    return this.catalogue.get(user.companyId, id);
  }

  @Patch(':id')
  @Roles('owner', 'estimator')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', new ParseUUIDPipe({ errorHttpStatusCode: 404 })) id: string,
    @Body() dto: UpdateMaterialDto,
  ): Promise<MaterialResponse> {
    return this.catalogue.update(user, id, dto);
  }
}
