import { Body, Controller, Delete, Get, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../../common/current-user';
import { ANY_ROLE, Roles } from '../../common/roles';
import { ID } from '../jobs.controller';
import { CreateLabourEntryDto, JobLabourResponse, RemoveLabourEntryQuery } from './labour.dto';
import { LabourService } from './labour.service';

/**
 * The hours a crew actually worked on a job. Owners and estimators record and strike out; the
 * storeman reads the sheet (hours and names, never what they cost).
 */
@ApiTags('jobs')
@ApiBearerAuth()
@Controller('jobs/:id/labour')
export class LabourController {
  constructor(private readonly labour: LabourService) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<JobLabourResponse> {
    return this.labour.list(user, id);
  }

  /** Records one entry; answers the whole sheet. */
  @Post()
  @Roles('owner', 'estimator')
  record(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: CreateLabourEntryDto,
  ): Promise<JobLabourResponse> {
    return this.labour.record(user, id, dto);
  }

  /** Strikes an entry out (kept on the sheet, no longer counted); answers the whole sheet. */
  @Delete(':entryId')
  @Roles('owner', 'estimator')
  remove(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Param('entryId', ID) entryId: string,
    @Query() query: RemoveLabourEntryQuery,
  ): Promise<JobLabourResponse> {
    return this.labour.remove(user, id, entryId, query);
  }
}
