import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiQuery, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { Roles } from '../common/roles';
import { BuildUpsService } from './build-ups.service';
import { BuildUpResponse, CreateBuildUpDto, UpdateBuildUpDto } from './dto/build-up.dto';

const ID = new ParseUUIDPipe({ errorHttpStatusCode: 404 });

/** Build-ups carry labour rates and markup, so the storeman does not see them. Only the owner edits. */
@ApiTags('build-ups')
@ApiBearerAuth()
@Controller('build-ups')
export class BuildUpsController {
  constructor(private readonly buildUps: BuildUpsService) {}

  @Get()
  @Roles('owner', 'estimator')
  @ApiQuery({ name: 'includeInactive', required: false, type: Boolean })
  list(
    @CurrentUser() user: AuthUser,
    @Query('includeInactive') includeInactive?: string,
  ): Promise<BuildUpResponse[]> {
    return this.buildUps.list(user.companyId, includeInactive === 'true');
  }

  @Post()
  @Roles('owner')
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateBuildUpDto): Promise<BuildUpResponse> {
    return this.buildUps.create(user.companyId, dto);
  }

  @Get(':id')
  @Roles('owner', 'estimator')
  get(@CurrentUser() user: AuthUser, @Param('id', ID) id: string): Promise<BuildUpResponse> {
    return this.buildUps.get(user.companyId, id);
  }

  @Patch(':id')
  @Roles('owner')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', ID) id: string,
    @Body() dto: UpdateBuildUpDto,
  ): Promise<BuildUpResponse> {
    return this.buildUps.update(user.companyId, id, dto);
  }
}
