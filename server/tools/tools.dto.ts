import { Type } from 'class-transformer';
import { IsDefined, IsIn, IsNumber, Max, Min, ValidateIf, ValidateNested } from 'class-validator';
import { Optional } from '../common/fields';
import { THREAD_SIDES, type ThreadSide } from '../../shared/threads/thread-table';
import { FLOW_UNITS, LENGTH_UNITS } from '../../shared/units';

const num = { allowNaN: false, allowInfinity: false };

export class LengthValueDto {
  @IsNumber(num, { message: 'must be a number' }) @Min(0.1, { message: 'must be more than 0' }) @Max(3000, { message: 'must be at most 3000' }) value: number;
  @IsIn(LENGTH_UNITS, { message: `must be one of ${LENGTH_UNITS.join(', ')}` }) unit: string;
}

export class FlowValueDto {
  @IsNumber(num, { message: 'must be a number' }) @Min(0.001, { message: 'must be more than 0' }) @Max(100000, { message: 'must be at most 100000' }) value: number;
  @IsIn(FLOW_UNITS, { message: `must be one of ${FLOW_UNITS.join(', ')}` }) unit: string;
}

export class ThreadMatchDto {
  @IsDefined({ message: 'is required: { value, unit }' }) @ValidateNested() @Type(() => LengthValueDto) majorDiameter: LengthValueDto;
  @Optional() @IsNumber(num, { message: 'must be a number' }) @Min(1, { message: 'must be 1 or more' }) @Max(80, { message: 'must be at most 80' }) threadsPerInch?: number;
  @Optional() @IsNumber(num, { message: 'must be a number' }) @Min(0.2, { message: 'must be at least 0.2 mm' }) @Max(20, { message: 'must be at most 20 mm' }) pitchMm?: number;
  @Optional() @IsNumber(num, { message: 'must be a number' }) @Min(20, { message: 'must be at least 20 degrees' }) @Max(90, { message: 'must be at most 90 degrees' }) flankAngleDeg?: number;
  @Optional() @IsIn(['tapered', 'parallel'], { message: 'must be tapered or parallel' }) taper?: 'tapered' | 'parallel';
  @Optional() @IsIn(THREAD_SIDES, { message: `must be ${THREAD_SIDES.join(' or ')}` }) side?: ThreadSide;
}

export class FlowDto {
  @IsDefined({ message: 'is required: { value, unit }' }) @ValidateNested() @Type(() => FlowValueDto) flow: FlowValueDto;
  @IsNumber(num, { message: 'must be a number' }) @Min(0.5, { message: 'must be at least 0.5 mm' }) @Max(500, { message: 'must be at most 500 mm' }) feedBoreMm: number;
  @Optional()
  @ValidateIf((_o, v) => v !== null)
  @IsNumber(num, { message: 'must be a number' })
  @Min(0.5, { message: 'must be at least 0.5 mm' })
  @Max(500, { message: 'must be at most 500 mm' })
  returnBoreMm?: number | null;
}
