import {
  Body,
  Controller,
  Get,
  HttpCode,
  Param,
  ParseUUIDPipe,
  Patch,
  Post,
  Put,
  Query,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import {
  CalendarQuery,
  ChangeStatusDto,
  CreateJobDto,
  ListJobsQuery,
  UpdateJobDto,
  UpdateSettingsDto,
} from './dto/job.dto';
import {
  CalendarEntry,
  JobDetailResponse,
  JobPage,
  JobSettingsResponse,
  RoofResponse,
} from './dto/job-response';
import { JobsService } from './jobs.service';
import { ReservationsService } from './reservations/reservations.service';
import { PutRoofDto } from './roof/roof.dto';

export const ID = new ParseUUIDPipe({ errorHttpStatusCode: 404 });

/** Jobs and their roofs. Everyone reads jobs (a storeman without their value); owners and estimators edit. */
@ApiTags('jobs')
@ApiBearerAuth()
@Controller()
export class JobsController {
  constructor(
    private readonly jobs: JobsService,
    private readonly reservations: ReservationsService,
  ) {}

  @Get('jobs')
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Query() query: ListJobsQuery): Promise<JobPage> {
    return this.jobs.list(user, query);
  }

  @Post('jobs')
  @Roles('owner', 'estimator')
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateJobDto): Promise<JobDetailResponse> {
    return this.jobs.create(user, dto);
  }

  /** Scheduled jobs between two dates with their material state. Declared before jobs/:id. */
  @Get('jobs/calendar')
  @Roles(...ANY_ROLE)
  calendar(@CurrentUser() user: AuthUser, @Query() query: CalendarQuery): Promise<CalendarEntry[]> {
    return this.jobs.calendar(user, query);
  }

  @Get('jobs/:id')
  @Roles(...ANY_ROLE)
  get(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<JobDetailResponse> {
    return this.jobs.get(user, id);
  }

  @Patch('jobs/:id')
  @Roles('owner', 'estimator')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: UpdateJobDto,
  ): Promise<JobDetailResponse> {
    return this.jobs.update(user, id, dto);
  }

  @Post('jobs/:id/status')
  @HttpCode(200)
  @Roles('owner', 'estimator')
  changeStatus(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: ChangeStatusDto,
  ): Promise<JobDetailResponse> {
    return this.jobs.changeStatus(user, id, dto, (m, job) =>
      this.reservations.onStatusChange(m, job, user.id),
    );
  }

  @Get('jobs/:id/roof')
  @Roles(...ANY_ROLE)
  getRoof(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<RoofResponse> {
    return this.jobs.getRoof(user, id);
  }

  @Put('jobs/:id/roof')
  @Roles('owner', 'estimator')
  putRoof(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: PutRoofDto,
  ): Promise<RoofResponse> {
    return this.jobs.putRoof(user, id, dto);
  }

  @Get('settings/jobs')
  @Roles('owner', 'estimator')
  settings(@CurrentUser() user: AuthUser): Promise<JobSettingsResponse> {
    return this.jobs.settings(user.companyId);
  }

  @Patch('settings/jobs')
  @Roles('owner')
  updateSettings(
    @CurrentUser() user: AuthUser,
    @Body() dto: UpdateSettingsDto,
  ): Promise<JobSettingsResponse> {
    return this.jobs.updateSettings(user, dto);
  }
}
