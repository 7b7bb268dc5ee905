import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthUser, CurrentUser } from '../common/current-user';
import { Roles } from '../common/roles';
import { InviteUserDto, UpdateUserDto, UserResponse } from './dto/user.dto';
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
