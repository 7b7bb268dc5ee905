import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsBoolean,
  IsEmail,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { ACTIVE_VALUES, ActiveQuery, PageQuery } from '../../catalogue/dto/page.dto';
import { OptionalNotNull, Trim, TrimToNull } from '../../catalogue/dto/validators';

const lowerToNull = () =>
  Transform(({ value }: { value: unknown }) => {
    if (typeof value !== 'string') {
      return value;
    }
    const t = value.trim().toLowerCase();
    return t === '' ? null : t;
  });

const F = {
  name: (max: number) => applyDecorators(Trim(), IsString(), MinLength(1, { message: 'must not be empty' }), MaxLength(max)),
  email: () => applyDecorators(lowerToNull(), IsString(), MaxLength(320), IsEmail({}, { message: 'must be an e-mail address' })),
  text: (max: number) => applyDecorators(TrimToNull(), IsString(), MaxLength(max)),
  leadTimeDays: () => applyDecorators(IsInt({ message: 'must be a whole number of days' }), Min(0), Max(365)),
  bool: () => IsBoolean({ message: 'must be true or false' }),
};

/** A person at a supplier. */
export class CreateContactDto {
  @ApiProperty({ maxLength: 120, example: 'Nell Farrow' }) @F.name(120) name: string;
  @ApiPropertyOptional({ nullable: true, type: String, example: 'nell@brackenfield.test' }) @IsOptional() @F.email() email?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 40 }) @IsOptional() @F.text(40) phone?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 60, example: 'Trade counter' }) @IsOptional() @F.text(60) role?: string | null;
}

export class UpdateContactDto {
  @ApiPropertyOptional({ maxLength: 120 }) @OptionalNotNull() @F.name(120) name?: string;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @F.email() email?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @F.text(40) phone?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @F.text(60) role?: string | null;
}

/** The body of POST /api/suppliers; `contacts` may be given at once. */
export class CreateSupplierDto {
  @ApiProperty({ maxLength: 160, description: 'Unique in the company (case-insensitive)' }) @F.name(160) name: string;

  @ApiPropertyOptional({ nullable: true, type: String, description: 'Where purchase orders are e-mailed' })
  @IsOptional()
  @F.email()
  orderEmail?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 40 }) @IsOptional() @F.text(40) phone?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 500 }) @IsOptional() @F.text(500) address?: string | null;
  @ApiPropertyOptional({ default: 3, minimum: 0, maximum: 365 }) @OptionalNotNull() @F.leadTimeDays() leadTimeDays?: number;
  @ApiPropertyOptional({ default: true }) @OptionalNotNull() @F.bool() active?: boolean;
  @ApiPropertyOptional({ nullable: true, type: String, maxLength: 2000 }) @IsOptional() @F.text(2000) notes?: string | null;

  @ApiPropertyOptional({ type: [CreateContactDto] })
  @OptionalNotNull()
  @IsArray({ message: 'must be a list of contacts' })
  @ArrayMaxSize(50)
  @ValidateNested({ each: true })
  @Type(() => CreateContactDto)
  contacts?: CreateContactDto[];
}

/** The body of PATCH /api/suppliers/{id}; `active: false` archives the supplier. Contacts have their own routes. */
export class UpdateSupplierDto {
  @ApiPropertyOptional({ maxLength: 160 }) @OptionalNotNull() @F.name(160) name?: string;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @F.email() orderEmail?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @F.text(40) phone?: string | null;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @F.text(500) address?: string | null;
  @ApiPropertyOptional() @OptionalNotNull() @F.leadTimeDays() leadTimeDays?: number;
  @ApiPropertyOptional() @OptionalNotNull() @F.bool() active?: boolean;
  @ApiPropertyOptional({ nullable: true, type: String }) @IsOptional() @F.text(2000) notes?: string | null;
}

export const SUPPLIER_SORTS = ['name', 'leadTimeDays', 'createdAt', 'updatedAt'] as const;
export type SupplierSort = (typeof SUPPLIER_SORTS)[number];

/** `GET /api/suppliers?q=&active=&sort=&order=&page=&pageSize=`; q looks in the name, order e-mail and contacts. */
export class SupplierListQuery extends PageQuery {
  @ApiPropertyOptional({ enum: ACTIVE_VALUES, default: 'true' })
  @IsOptional()
  @IsIn(ACTIVE_VALUES, { message: `must be one of ${ACTIVE_VALUES.join(', ')}` })
  active?: ActiveQuery;

  @ApiPropertyOptional({ enum: SUPPLIER_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(SUPPLIER_SORTS, { message: `must be one of ${SUPPLIER_SORTS.join(', ')}` })
  sort?: SupplierSort;
}

export class ContactResponse {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: String }) role: string | null;
  @ApiProperty() createdAt: string;
}

export class SupplierResponse {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) orderEmail: string | null;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: String }) address: string | null;
  @ApiProperty() leadTimeDays: number;
  @ApiProperty() active: boolean;
  @ApiProperty({ nullable: true, type: String }) notes: string | null;
  @ApiProperty({ type: [ContactResponse], description: 'By name' }) contacts: ContactResponse[];
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class SupplierPage {
  @ApiProperty({ type: [SupplierResponse] }) items: SupplierResponse[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}
