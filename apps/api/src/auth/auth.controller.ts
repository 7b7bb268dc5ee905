import { Body, Controller, Get, HttpCode, Param, Post, Req } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthedRequest, AuthUser, CurrentUser } from '../common/current-user';
import { ANY_ROLE, Public, Roles } from '../common/roles';
import { AuthService } from './auth.service';
import { InvitationResponse, LoginDto, NewPasswordDto, RegisterDto, SessionResponse, SessionUser } from './dto/auth.dto';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Post('register')
  register(@Body() dto: RegisterDto): Promise<SessionResponse> {
    return this.auth.register(dto);
  }

  @Public()
  @Post('login')
  @HttpCode(200)
  login(@Body() dto: LoginDto, @Req() req: AuthedRequest): Promise<SessionResponse> {
    return this.auth.login(dto, req.ip ?? 'unknown');
  }

  @ApiBearerAuth()
  @Roles(...ANY_ROLE)
  @Get('me')
  me(@CurrentUser() user: AuthUser): Promise<SessionUser> {
    return this.auth.me(user.id, user.companyId);
  }

  @Public()
  @Get('invitations/:token')
  invitation(@Param('token') token: string): Promise<InvitationResponse> {
    return this.auth.invitation(token);
  }

  @Public()
  @Post('invitations/:token/accept')
  @HttpCode(200)
  accept(@Param('token') token: string, @Body() dto: NewPasswordDto): Promise<SessionResponse> {
    return this.auth.acceptInvitation(token, dto.password);
  }
}
