import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsIn, IsNumber, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateIf, ValidateNested } from 'class-validator';

const num = { allowNaN: false, allowInfinity: false };

export class AdHocOpeningDto {
  @IsOptional() @IsString() @MaxLength(40) label?: string;
  @IsString({ message: 'must be a thread code' }) @MaxLength(40) threadCode: string;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @IsString({ message: 'must be a key code or null' }) @MaxLength(40) keyCode?: string | null;
  @IsOptional() @IsNumber(num, { message: 'must be a number' }) @Min(0.1) @Max(500) boreMm?: number;
}

export class AdHocDrumDto {
  @IsNumber(num, { message: 'must be a number' }) @Min(1, { message: 'must be more than 0 mm' }) @Max(3000, { message: 'must be at most 3000 mm' }) insideDepthMm: number;
  @ValidateNested({ each: true }) @Type(() => AdHocOpeningDto) @ArrayMinSize(1, { message: 'must list at least one opening' }) @ArrayMaxSize(6) openings: AdHocOpeningDto[];
}

export class FitCheckDto {
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) drumTypeId?: string;
  @IsOptional() @ValidateNested() @Type(() => AdHocDrumDto) drum?: AdHocDrumDto;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) slurryId?: string;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) stationId?: string;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) tubeSetId?: string;
  @IsOptional() @IsIn(['two-opening', 'one-opening'], { message: 'must be two-opening or one-opening' }) tapping?: 'two-opening' | 'one-opening';
  @IsOptional() @IsIn(['pump', 'mechanical'], { message: 'must be pump or mechanical' }) agitation?: 'pump' | 'mechanical';
  @IsOptional() @IsNumber(num, { message: 'must be a number' }) @Min(0.01, { message: 'must be more than 0 L/min' }) @Max(2000, { message: 'must be at most 2000 L/min' }) flowLpm?: number;
}
