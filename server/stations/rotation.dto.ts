import { IsInt, Max, IsString, IsUUID, MaxLength, Min } from 'class-validator';
import { LOT_NUMBER_MAX_LENGTH, LOT_NUMBER_MESSAGES } from '../../shared/lot-number';
import { Optional } from '../common/fields';

export class RinseDto {
  @Optional() @IsString({ message: 'must be text' }) @MaxLength(500, { message: 'must be at most 500 characters' }) note?: string;
}

export class StandbyDto {
  /** The receiving check of the lot the new standby drum belongs to (or just its lot number). */
  @Optional() @IsUUID('all', { message: 'must be an id' }) receivingCheckId?: string;
  @Optional() @IsString({ message: 'must be text' }) @MaxLength(LOT_NUMBER_MAX_LENGTH, { message: LOT_NUMBER_MESSAGES.tooLong }) lotNumber?: string;
  @Optional() @IsString({ message: 'must be text' }) @MaxLength(60) drumSerial?: string;
  @IsInt({ message: 'is required: the version you last read' })
  @Min(1, { message: 'must be the version you last read' })
  @Max(2147483647, { message: 'must be the version you last read' })
  version: number;
}
