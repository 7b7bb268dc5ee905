import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import {
  CreateEstimateDto,
  EstimateResponse,
  EstimateSummaryResponse,
  LayingCheckDto,
  LayingCheckResponse,
} from './dto/estimate.dto';
import { EstimatesService } from './estimates.service';
import { ID } from './jobs.controller';
import { QuoteService } from './quote.service';
import { ReservationsService } from './reservations/reservations.service';

const VERSION = new ParseIntPipe({ errorHttpStatusCode: 404 });

/** Estimates carry prices: owners and estimators only (a storeman gets 403). */
@ApiTags('estimates')
@ApiBearerAuth()
@Controller()
export class EstimatesController {
  constructor(
    private readonly estimates: EstimatesService,
    private readonly quotes: QuoteService,
    private readonly reservations: ReservationsService,
  ) {}

  @Post('jobs/:id/estimates')
  @Roles('owner', 'estimator')
  create(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: CreateEstimateDto,
  ): Promise<EstimateResponse> {
    return this.estimates.create(user, id, dto);
  }

  @Get('jobs/:id/estimates')
  @Roles('owner', 'estimator')
  list(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<EstimateSummaryResponse[]> {
    return this.estimates.list(user, id);
  }

  @Get('jobs/:id/estimates/:n')
  @Roles('owner', 'estimator')
  get(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Param('n', VERSION) n: number,
  ): Promise<EstimateResponse> {
    return this.estimates.get(user, id, n);
  }

  @Post('jobs/:id/estimates/:n/accept')
  @HttpCode(200)
  @Roles('owner', 'estimator')
  accept(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Param('n', VERSION) n: number,
  ): Promise<EstimateResponse> {
    return this.estimates.accept(user, id, n, (m, job, e) => this.reservations.beforeAccept(m, job, e));
  }

  @Get('jobs/:id/estimates/:n/quote.pdf')
  @Roles('owner', 'estimator')
  @ApiProduces('application/pdf')
  async quote(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Param('n', VERSION) n: number,
    @Res() res: Response,
  ): Promise<void> {
    const { pdf, filename } = await this.quotes.render(user, id, n);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
    res.send(pdf);
  }

  @Post('laying-check')
  @HttpCode(200)
  @Roles(...ANY_ROLE)
  layingCheck(@Body() dto: LayingCheckDto): LayingCheckResponse {
    return this.estimates.layingCheck(dto);
  }
}
