import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { CreateLocationDto, LocationResponse, UpdateLocationDto } from './dto/location.dto';
import { LocationsService } from './locations.service';

const id404 = new ParseUUIDPipe({ errorHttpStatusCode: 404 });

@ApiTags('stock')
@ApiBearerAuth()
@Controller('locations')
export class LocationsController {
  constructor(private readonly locations: LocationsService) {}

  @Get()
  @Roles(...ANY_ROLE)
  list(@CurrentUser() user: AuthUser): Promise<LocationResponse[]> {
    return this.locations.list(user.companyId);
  }

  @Get(':id')
  @Roles(...ANY_ROLE)
  get(@CurrentUser() user: AuthUser, @Param('id', id404) id: string): Promise<LocationResponse> {
    return this.locations.get(user.companyId, id);
  }

  @Post()
  @Roles('owner', 'storeman')
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateLocationDto): Promise<LocationResponse> {
    return this.locations.create(user, dto);
  }

  @Patch(':id')
  @Roles('owner', 'storeman')
  update(@CurrentUser() user: AuthUser, @Param('id', id404) id: string, @Body() dto: UpdateLocationDto): Promise<LocationResponse> {
    return this.locations.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @Roles('owner', 'storeman')
  remove(@CurrentUser() user: AuthUser, @Param('id', id404) id: string): Promise<void> {
    return this.locations.remove(user, id);
  }
}
