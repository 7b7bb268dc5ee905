import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../../common/roles';
import { MIN_PASSWORD_LENGTH } from '../password';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const lower = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value);

export class LoginDto {
  @ApiProperty({ example: 'owner@demo.test' })
  @Transform(lower)
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(320)
  email: string;

  @ApiProperty()
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(200)
  password: string;
}

export class NewPasswordDto {
  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH })
  @IsString()
  @MinLength(MIN_PASSWORD_LENGTH, { message: `must be at least ${MIN_PASSWORD_LENGTH} characters` })
  @MaxLength(200)
  password: string;
}

export class RegisterDto extends NewPasswordDto {
  @ApiProperty({ example: 'Example Roofing Ltd' })
  @Transform(trim)
  @IsString()
  @MinLength(2, { message: 'must be at least 2 characters' })
  @MaxLength(120)
  companyName: string;

  @ApiProperty({ example: 'Alex Example' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiProperty({ example: 'alex@example.test' })
  @Transform(lower)
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(320)
  email: string;
}

export class SessionUser {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty() companyId: string;
  @ApiProperty() companyName: string;
}

export class SessionResponse {
  @ApiProperty() accessToken: string;
  @ApiProperty({ type: SessionUser }) user: SessionUser;
}

export class InvitationResponse {
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty() companyName: string;
}
