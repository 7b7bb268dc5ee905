import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { Trim } from './validators';

export const DEFAULT_PAGE_SIZE = 25;
export const MAX_PAGE_SIZE = 200;

/** `?page=&pageSize=&order=&q=` shared by every list route of the catalogue and suppliers. */
export class PageQuery {
  @ApiPropertyOptional({ description: 'Words to look for (code, name…)', maxLength: 100 })
  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(100)
  q?: string;

  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'must be a whole number' })
  @Min(1)
  page?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: MAX_PAGE_SIZE, default: DEFAULT_PAGE_SIZE })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'must be a whole number' })
  @Min(1)
  @Max(MAX_PAGE_SIZE)
  pageSize?: number;

  @ApiPropertyOptional({ enum: ['asc', 'desc'], default: 'asc' })
  @IsOptional()
  @IsIn(['asc', 'desc'], { message: 'must be asc or desc' })
  order?: 'asc' | 'desc';
}

/** `?active=true|false|all` (default true: archived records are left out). */
export type ActiveQuery = 'true' | 'false' | 'all';
export const ACTIVE_VALUES: ActiveQuery[] = ['true', 'false', 'all'];

export function pageOf(query: PageQuery): { page: number; pageSize: number; offset: number } {
  const page = query.page ?? 1;
  const pageSize = query.pageSize ?? DEFAULT_PAGE_SIZE;
  return { page, pageSize, offset: (page - 1) * pageSize };
}
