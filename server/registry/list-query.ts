import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

/** The list query every registry resource accepts: ?q=&sort=&order=&page=&pageSize= plus filters. */
export class ListQueryDto {
  @IsOptional() @IsString() @MaxLength(100, { message: 'must be at most 100 characters' }) q?: string;
  @IsOptional() @IsString() sort?: string;
  @IsOptional() @IsIn(['asc', 'desc'], { message: 'must be asc or desc' }) order?: 'asc' | 'desc';
  @IsOptional() @Type(() => Number) @IsInt({ message: 'must be a whole number' }) @Min(1, { message: 'must be 1 or more' }) page?: number;
  @IsOptional() @Type(() => Number) @IsInt({ message: 'must be a whole number' }) @Min(1, { message: 'must be 1 or more' }) @Max(200, { message: 'must be at most 200' }) pageSize?: number;
  @IsOptional() @IsString() region?: string;
  @IsOptional() @IsString() thread?: string;
  @IsOptional() @IsString() key?: string;
  @IsOptional() @IsString() status?: string;
  @IsOptional() @IsString() supplierId?: string;
  @IsOptional() @IsString() stationId?: string;
}
