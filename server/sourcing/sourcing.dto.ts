import { ArrayMaxSize, ArrayMinSize, IsArray, IsBoolean, IsIn, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min, MinLength } from 'class-validator';
import { IsCalendarDate, Optional } from '../common/fields';

export class SourcingPlanDto {
  @IsString({ message: 'must be text' }) @MinLength(1, { message: 'is required' }) @MaxLength(120, { message: 'must be at most 120 characters' }) slurryName: string;
  @IsUUID('all', { message: 'must be an id' }) supplierId: string;
  @IsUUID('all', { message: 'must be an id' }) drumTypeId: string;
  @IsCalendarDate() startDate: string;
  @IsInt({ message: 'must be a whole number' }) @Min(1, { message: 'must be 1 or more' }) @Max(10000, { message: 'must be at most 10000' }) drumsPerMonth: number;
  @Optional()
  @IsArray({ message: 'must be a list of station ids' })
  @IsUUID('all', { each: true, message: 'must be a list of station ids' })
  @ArrayMinSize(1, { message: 'must name at least one station' })
  @ArrayMaxSize(200)
  stationIds?: string[];
  @Optional() @IsBoolean({ message: 'must be true or false' }) foams?: boolean;
  @Optional() @IsBoolean({ message: 'must be true or false' }) shearSensitive?: boolean;
  @Optional() @IsString({ message: 'must be text' }) @MaxLength(2000) notes?: string;
}

export class WarningListDto {
  @IsOptional() @IsIn(['open', 'acknowledged', 'resolved'], { message: 'must be open, acknowledged or resolved' }) status?: string;
}
