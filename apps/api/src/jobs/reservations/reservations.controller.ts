import { Body, Controller, Delete, Get, HttpCode, Param, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiHeader, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { AuthUser, CurrentUser } from '../../common/current-user';
import { ANY_ROLE, Roles } from '../../common/roles';
import { CompaniesService } from '../../companies/companies.service';
import { IdempotencyKey } from '../../stock/idempotency-key.decorator';
import { ID } from '../jobs.controller';
import { renderPickList } from './pick-list-pdf';
import {
  IssueDto,
  PickListResponse,
  ReconciliationResponse,
  ReservationsResponse,
  ReturnDto,
  SiteMovementResponse,
} from './reservation.dto';
import { ReservationsService } from './reservations.service';
import { SiteStockService } from './site-stock.service';

const IDEMPOTENCY = {
  name: 'Idempotency-Key',
  required: false,
  description: 'the same key on a retry answers the first result and changes nothing',
};

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('jobs/:id')
export class ReservationsController {
  constructor(
    private readonly reservations: ReservationsService,
    private readonly site: SiteStockService,
    private readonly companies: CompaniesService,
  ) {}

  @Get('reservations')
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<ReservationsResponse> {
    return this.reservations.view(user.companyId, id);
  }

  @Post('reservations')
  @HttpCode(200)
  @Roles('owner', 'estimator')
  reserve(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<ReservationsResponse> {
    return this.reservations.reserve(user, id);
  }

  @Delete('reservations')
  @Roles('owner', 'estimator')
  release(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<ReservationsResponse> {
    return this.reservations.release(user, id);
  }

  @Get('pick-list')
  @Roles(...ANY_ROLE)
  pickList(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<PickListResponse> {
    return this.site.pickList(user, id);
  }

  @Get('pick-list.pdf')
  @Roles(...ANY_ROLE)
  @ApiProduces('application/pdf')
  async pickListPdf(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Res() res: Response,
  ): Promise<void> {
    const list = await this.site.pickList(user, id);
    const company = await this.companies.get(user.companyId);
    const pdf = await renderPickList(list, company.name);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `inline; filename="pick-list-${list.reference}.pdf"`);
    res.send(pdf);
  }

  @Post('issues')
  @Roles('owner', 'storeman')
  @ApiHeader(IDEMPOTENCY)
  issue(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: IssueDto,
    @IdempotencyKey() key?: string,
  ): Promise<SiteMovementResponse> {
    return this.site.issue(user, id, dto, key);
  }

  @Post('returns')
  @Roles('owner', 'storeman')
  @ApiHeader(IDEMPOTENCY)
  return(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: ReturnDto,
    @IdempotencyKey() key?: string,
  ): Promise<SiteMovementResponse> {
    return this.site.return(user, id, dto, key);
  }

  @Get('reconciliation')
  @Roles('owner', 'estimator')
  reconciliation(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
  ): Promise<ReconciliationResponse> {
    return this.site.reconciliation(user, id);
  }
}
