import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min, MinLength, ValidateNested } from 'class-validator';
import { TEMPERATURE_INDICATORS } from '../../shared/acceptance/types';
import { LOT_STATUSES } from '../../shared/dock/lot-status';
import { AdHocDrumDto } from '../fit/fit-check.dto';

const DATE = /^\d{4}-\d{2}-\d{2}$/;

export class ReceivingCheckDto {
  @IsString({ message: 'must be text' }) @MinLength(1, { message: 'is required' }) @MaxLength(60, { message: 'must be at most 60 characters' })
  @Matches(/^[\p{L}\p{N}][\p{L}\p{N}\-_./ ]*$/u, { message: 'may hold letters, digits, spaces and - _ . /' })
  lotNumber: string;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) supplierId?: string;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) slurryId?: string;
  @IsInt({ message: 'must be a whole number' }) @Min(1, { message: 'must be 1 or more' }) @Max(1000, { message: 'must be at most 1000' }) drumCount: number;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) drumTypeId?: string;
  @IsOptional() @ValidateNested() @Type(() => AdHocDrumDto) drum?: AdHocDrumDto;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) stationId?: string;
  // The lot as its label says; the service also refuses dates that cannot be meant (shared/acceptance).
  @IsOptional() @IsString({ message: 'must be a date, YYYY-MM-DD' }) @Matches(DATE, { message: 'must be a date, YYYY-MM-DD' }) productionDate?: string;
  @IsOptional() @IsString({ message: 'must be a date, YYYY-MM-DD' }) @Matches(DATE, { message: 'must be a date, YYYY-MM-DD' }) expiryDate?: string;
  @IsOptional() @IsIn(TEMPERATURE_INDICATORS, { message: `must be one of ${TEMPERATURE_INDICATORS.join(', ')}` }) temperatureIndicator?: (typeof TEMPERATURE_INDICATORS)[number];
}

export class HoldDto {
  @IsString({ message: 'must be text' }) @MinLength(3, { message: 'must say why (at least 3 characters)' }) @MaxLength(2000) reason: string;
}

export class ReleaseDto {
  @IsString({ message: 'must be text' }) @MinLength(3, { message: 'must say why (at least 3 characters)' }) @MaxLength(2000) comment: string;
}

export class ReceivingListDto {
  @IsOptional() @IsString() @MaxLength(60) q?: string;
  @IsOptional() @IsIn(['fits', 'caution', 'no-fit'], { message: 'must be fits, caution or no-fit' }) verdict?: string;
  @IsOptional() @IsIn(LOT_STATUSES, { message: `must be one of ${LOT_STATUSES.join(', ')}` }) status?: string;
  @IsOptional() @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'must be a date, YYYY-MM-DD' }) from?: string;
  @IsOptional() @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'must be a date, YYYY-MM-DD' }) to?: string;
  @IsOptional() @Type(() => Number) @IsInt({ message: 'must be a whole number' }) @Min(1) page?: number;
  @IsOptional() @Type(() => Number) @IsInt({ message: 'must be a whole number' }) @Min(1) @Max(200, { message: 'must be at most 200' }) pageSize?: number;
}
