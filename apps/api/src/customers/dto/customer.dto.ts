import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsEmail, IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min, MinLength } from 'class-validator';
import { trim, trimToNull } from '../../costing/validation';
import type { Customer } from '../entities/customer.entity';

export class CreateCustomerDto {
  @ApiProperty({ example: 'Harrow Lane Surgery' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(160)
  name: string;

  @ApiPropertyOptional({ example: 'Priya Lennox' })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(120)
  contactName?: string | null;

  @ApiPropertyOptional({ example: 'practice@harrowlane.test' })
  @IsOptional()
  @Transform(trimToNull)
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(320)
  email?: string | null;

  @ApiPropertyOptional({ example: '01632 960 118' })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(40)
  phone?: string | null;

  @ApiPropertyOptional({ example: '3 Harrow Lane, Hollowmere HM2 7PD' })
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(500)
  billingAddress?: string | null;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(2000)
  notes?: string | null;
}

export class UpdateCustomerDto {
  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'must not be empty' })
  @MaxLength(160)
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(120)
  contactName?: string | null;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(320)
  email?: string | null;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(40)
  phone?: string | null;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(500)
  billingAddress?: string | null;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimToNull)
  @IsString()
  @MaxLength(2000)
  notes?: string | null;
}

export const CUSTOMER_SORTS = ['name', '-name', 'createdAt', '-createdAt', 'jobCount', '-jobCount'] as const;
export type CustomerSort = (typeof CUSTOMER_SORTS)[number];

export class ListCustomersQuery {
  @ApiPropertyOptional({ enum: CUSTOMER_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(CUSTOMER_SORTS, { message: `must be one of ${CUSTOMER_SORTS.join(', ')}` })
  sort?: CustomerSort;

  @ApiPropertyOptional({ description: 'part of the name, contact or e-mail' })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MaxLength(100)
  q?: string;

  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  page?: number;

  @ApiPropertyOptional({ default: 50 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(200)
  pageSize?: number;
}

export class CustomerResponse {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) contactName: string | null;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: String }) billingAddress: string | null;
  @ApiProperty({ nullable: true, type: String }) notes: string | null;
  @ApiProperty() jobCount: number;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;

  static from(c: Customer, jobCount = 0): CustomerResponse {
    return {
      id: c.id,
      name: c.name,
      contactName: c.contactName,
      email: c.email,
      phone: c.phone,
      billingAddress: c.billingAddress,
      notes: c.notes,
      jobCount,
      createdAt: c.createdAt.toISOString(),
      updatedAt: c.updatedAt.toISOString(),
    };
  }
}

export class CustomerPage {
  @ApiProperty({ type: [CustomerResponse] }) items: CustomerResponse[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}
