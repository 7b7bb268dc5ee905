import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Roles } from '../common/roles';
import { EstimatorResponse, InviteUserDto, UpdateUserDto, UserResponse } from './dto/user.dto';
import { UsersService } from './users.service';

@ApiTags('users')
@ApiBearerAuth()
@Controller('users')
@Roles('owner')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<UserResponse[]> {
    return this.users.list(user.companyId);
  }

  /**
   * The company's active people who can be a job's estimator (owners and estimators), for every
   * signed-in role: id, name and role only (e-mail addresses stay with the owner's list).
   */
  @Get('estimators')
  @Roles(...ANY_ROLE)
  estimators(@CurrentUser() user: AuthUser): Promise<EstimatorResponse[]> {
    return this.users.estimators(user.companyId);
  }

  @Post('invitations')
  invite(@CurrentUser() user: AuthUser, @Body() dto: InviteUserDto): Promise<UserResponse> {
    return this.users.invite(user, dto);
  }

  @Patch(':id')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', new ParseUUIDPipe({ errorHttpStatusCode: 404 })) id: string,
    @Body() dto: UpdateUserDto,
  ): Promise<UserResponse> {
    return this.users.update(user, id, dto);
  }
}
