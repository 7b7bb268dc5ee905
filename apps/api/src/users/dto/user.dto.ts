import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsEmail, IsIn, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { Role, ROLES } from '../../common/roles';
import type { User } from '../entities/user.entity';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const lower = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value);

export class InviteUserDto {
  @ApiProperty({ example: 'sam@example.test' })
  @Transform(lower)
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(320)
  email: string;

  @ApiProperty({ example: 'Sam Wren' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(120)
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `must be one of ${ROLES.join(', ')}` })
  role: Role;
}

export class UpdateUserDto {
  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES, { message: `must be one of ${ROLES.join(', ')}` })
  role?: Role;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean()
  active?: boolean;
}

export type UserStatus = 'active' | 'invited' | 'inactive';

export class UserResponse {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty({ enum: ['active', 'invited', 'inactive'] }) status: UserStatus;
  @ApiProperty() createdAt: string;

  static from(u: User, hasPassword: boolean): UserResponse {
    return {
      id: u.id,
      email: u.email,
      name: u.name,
      role: u.role,
      status: !u.active ? 'inactive' : hasPassword ? 'active' : 'invited',
      createdAt: u.createdAt.toISOString(),
    };
  }
}

/** Someone who can be a job's estimator, as every role may see them: no e-mail address. */
export class EstimatorResponse {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ['owner', 'estimator'] }) role: Role;
}
