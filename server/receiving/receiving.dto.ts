import { Type } from 'class-transformer';
import { IsIn, IsInt, IsISO8601, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min, MinLength, ValidateNested } from 'class-validator';
import { LOT_NUMBER_MAX_LENGTH, LOT_NUMBER_MESSAGES, LOT_NUMBER_PATTERN } from '../../shared/lot-number';
import { IsCalendarDate, Optional, PageParam, PageSizeParam } from '../common/fields';
import { TEMPERATURE_INDICATORS } from '../../shared/acceptance/types';
import { LOT_STATUSES } from '../../shared/contract/lot-status';
import { FIT_VERDICTS, LOT_DECISIONS, type Verdict } from '../../shared/contract/verdicts';
import { AdHocDrumDto } from '../fit/fit-check.dto';

/** What the phone decided for a check it made with no network (compared with the server's decision). */
export class ProvisionalDto {
  @IsIn(LOT_DECISIONS, { message: `must be one of ${LOT_DECISIONS.join(', ')}` }) decision: (typeof LOT_DECISIONS)[number];
  @IsIn(FIT_VERDICTS, { message: `must be one of ${FIT_VERDICTS.join(', ')}` }) verdict: Verdict;
  @IsString({ message: 'must be text' }) @MaxLength(2000, { message: 'must be at most 2000 characters' }) sentence: string;
  @IsString({ message: 'must be text' }) @MaxLength(40, { message: 'must be at most 40 characters' }) revision: string;
  @IsISO8601({ strict: true }, { message: 'must be a date and time' }) madeAt: string;
}

export class ReceivingCheckDto {
  /** The phone's key for this check: sending the same key again records nothing new. */
  @Optional() @IsUUID('all', { message: 'must be an id' }) clientKey?: string;
  @Optional() @ValidateNested() @Type(() => ProvisionalDto) provisional?: ProvisionalDto;
  @IsString({ message: 'must be text' })
  @MinLength(1, { message: LOT_NUMBER_MESSAGES.required })
  @MaxLength(LOT_NUMBER_MAX_LENGTH, { message: LOT_NUMBER_MESSAGES.tooLong })
  @Matches(LOT_NUMBER_PATTERN, { message: LOT_NUMBER_MESSAGES.characters })
  lotNumber: string;
  @Optional() @IsUUID('all', { message: 'must be an id' }) supplierId?: string;
  @Optional() @IsUUID('all', { message: 'must be an id' }) slurryId?: string;
  @IsInt({ message: 'must be a whole number' }) @Min(1, { message: 'must be 1 or more' }) @Max(1000, { message: 'must be at most 1000' }) drumCount: number;
  @Optional() @IsUUID('all', { message: 'must be an id' }) drumTypeId?: string;
  @Optional() @ValidateNested() @Type(() => AdHocDrumDto) drum?: AdHocDrumDto;
  @Optional() @IsUUID('all', { message: 'must be an id' }) stationId?: string;
  // The lot as its label says; the service also refuses dates that cannot be meant (shared/acceptance).
  @Optional() @IsCalendarDate() productionDate?: string;
  @Optional() @IsCalendarDate() expiryDate?: string;
  @Optional() @IsIn(TEMPERATURE_INDICATORS, { message: `must be one of ${TEMPERATURE_INDICATORS.join(', ')}` }) temperatureIndicator?: (typeof TEMPERATURE_INDICATORS)[number];
}

export class HoldDto {
  @IsString({ message: 'must be text' }) @MinLength(3, { message: 'must say why (at least 3 characters)' }) @MaxLength(2000) reason: string;
}

export class ReleaseDto {
  @IsString({ message: 'must be text' }) @MinLength(3, { message: 'must say why (at least 3 characters)' }) @MaxLength(2000) comment: string;
}

export class ReceivingListDto {
  @IsOptional() @IsString({ message: 'must be given once, as text' }) @MaxLength(60) q?: string;
  @IsOptional() @IsIn(['fits', 'caution', 'no-fit'], { message: 'must be fits, caution or no-fit' }) verdict?: string;
  @IsOptional() @IsIn(LOT_STATUSES, { message: `must be one of ${LOT_STATUSES.join(', ')}` }) status?: string;
  @IsOptional() @IsCalendarDate() from?: string;
  @IsOptional() @IsCalendarDate() to?: string;
  @PageParam page?: number;
  @PageSizeParam pageSize?: number;
}
