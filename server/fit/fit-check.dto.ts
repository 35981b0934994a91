import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsIn, IsNumber, IsString, IsUUID, Max, MaxLength, Min, ValidateIf, ValidateNested } from 'class-validator';
import { Optional } from '../common/fields';

const num = { allowNaN: false, allowInfinity: false };

export class AdHocOpeningDto {
  @Optional() @IsString() @MaxLength(40) label?: string;
  @IsString({ message: 'must be a thread code' }) @MaxLength(40) threadCode: string;
  @Optional() @ValidateIf((_o, v) => v !== null) @IsString({ message: 'must be a key code or null' }) @MaxLength(40) keyCode?: string | null;
  @Optional() @IsNumber(num, { message: 'must be a number' }) @Min(0.1) @Max(500) boreMm?: number;
}

export class AdHocDrumDto {
  @IsNumber(num, { message: 'must be a number' }) @Min(1, { message: 'must be more than 0 mm' }) @Max(3000, { message: 'must be at most 3000 mm' }) insideDepthMm: number;
  @ValidateNested({ each: true }) @Type(() => AdHocOpeningDto) @ArrayMinSize(1, { message: 'must list at least one opening' }) @ArrayMaxSize(6) openings: AdHocOpeningDto[];
}

export class FitCheckDto {
  @Optional() @IsUUID('all', { message: 'must be an id' }) drumTypeId?: string;
  @Optional() @ValidateNested() @Type(() => AdHocDrumDto) drum?: AdHocDrumDto;
  @Optional() @IsUUID('all', { message: 'must be an id' }) slurryId?: string;
  @Optional() @IsUUID('all', { message: 'must be an id' }) stationId?: string;
  @Optional() @IsUUID('all', { message: 'must be an id' }) tubeSetId?: string;
  @Optional() @IsIn(['two-opening', 'one-opening'], { message: 'must be two-opening or one-opening' }) tapping?: 'two-opening' | 'one-opening';
  @Optional() @IsIn(['pump', 'mechanical'], { message: 'must be pump or mechanical' }) agitation?: 'pump' | 'mechanical';
  @Optional() @IsNumber(num, { message: 'must be a number' }) @Min(0.01, { message: 'must be more than 0 L/min' }) @Max(2000, { message: 'must be at most 2000 L/min' }) flowLpm?: number;
}
