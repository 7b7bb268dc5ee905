import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildUpsModule } from '../build-ups/build-ups.module';
import { CompaniesModule } from '../companies/companies.module';
import { CostingModule } from '../costing/costing.module';
import { CustomersModule } from '../customers/customers.module';
import { CompanySettings } from './entities/company-settings.entity';
import { Estimate } from './entities/estimate.entity';
import { EstimateLine } from './entities/estimate-line.entity';
import { EstimateMaterial } from './entities/estimate-material.entity';
import { EstimatePack } from './entities/estimate-pack.entity';
import { Job } from './entities/job.entity';
import { JobStatusChange } from './entities/job-status-change.entity';
import { EstimatesController } from './estimates.controller';
import { EstimatesService } from './estimates.service';
import { JobsController } from './jobs.controller';
import { JobsService } from './jobs.service';
import { LabourEntry } from './labour/labour-entry.entity';
import { LabourController } from './labour/labour.controller';
import { LabourService } from './labour/labour.service';
import { MaterialStates } from './material-states';
import { QuoteService } from './quote.service';
import { ReservationsController } from './reservations/reservations.controller';
import { ReservationsService } from './reservations/reservations.service';
import { SiteStockService } from './reservations/site-stock.service';
import { StockModule } from '../stock/stock.module';

/**
 * Jobs: customers, jobs and their roofs, build-ups, estimates and quotes, reservations, issues and
 * returns. Customers, build-ups and costing are sibling modules registered from here.
 */
@Module({
  imports: [
    TypeOrmModule.forFeature([
      Job,
      JobStatusChange,
      CompanySettings,
      Estimate,
      EstimateLine,
      EstimateMaterial,
      EstimatePack,
      LabourEntry,
    ]),
    CompaniesModule,
    CustomersModule,
    BuildUpsModule,
    CostingModule,
    StockModule,
  ],
  controllers: [JobsController, EstimatesController, ReservationsController, LabourController],
  providers: [
    JobsService,
    EstimatesService,
    QuoteService,
    MaterialStates,
    ReservationsService,
    SiteStockService,
    LabourService,
  ],
  exports: [JobsService],
})
export class JobsModule {}
