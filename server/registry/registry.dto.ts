import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsBoolean,
  IsEmail,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { Optional } from '../common/fields';
import { DIP_TUBE_LIMITS as TUBE } from '../../shared/records/dip-tube';
import { DRUM_TYPE_LIMITS as DRUM } from '../../shared/records/drum-type';
import { REGIONS, SUITED_TO, THREAD_FAMILIES } from '../entities/registry';

// Shared field rules. Lengths are mm; the upper bounds reject absurd values (a drum is not 10 m deep).
const num = { allowNaN: false, allowInfinity: false };
const NUMBER = 'must be a number';
/** What a thread code and a key code may hold; the list filters check the same forms. */
export const THREAD_CODE_PATTERN = /^[A-Za-z0-9][A-Za-z0-9/.\-x ]*$/;
export const THREAD_CODE_SAYS = 'may hold letters, digits, / . - and x';
export const KEY_CODE_PATTERN = /^[A-Za-z0-9][A-Za-z0-9\-_]*$/;
export const KEY_CODE_SAYS = 'may hold letters, digits, - and _';
const Mm = (max: number) => (target: object, key: string) => {
  IsNumber(num, { message: NUMBER })(target, key);
  Min(0.1, { message: 'must be more than 0 mm' })(target, key);
  Max(max, { message: `must be at most ${max} mm` })(target, key);
};
const Name =
  (max = 120) =>
  (target: object, key: string) => {
    IsString({ message: 'must be text' })(target, key);
    MinLength(1, { message: 'is required' })(target, key);
    MaxLength(max, { message: `must be at most ${max} characters` })(target, key);
  };
const Code = (target: object, key: string) => {
  IsString({ message: 'must be text' })(target, key);
  MaxLength(40, { message: 'must be at most 40 characters' })(target, key);
};
const Notes = (target: object, key: string) => {
  IsOptional()(target, key);
  IsString({ message: 'must be text' })(target, key);
  MaxLength(2000, { message: 'must be at most 2000 characters' })(target, key);
};
const Id = (target: object, key: string) => IsUUID('all', { message: 'must be an id' })(target, key);
const OneOf = (values: readonly string[]) => IsIn(values, { message: `must be one of ${values.join(', ')}` });
/** A nullable reference by code: null clears it, a string must be a known code (checked by the service). */
const NullableCode = (target: object, key: string) => {
  ValidateIf((_o, v) => v !== null)(target, key);
  Code(target, key);
};

export class SupplierDto {
  @Name() name: string;
  @OneOf(REGIONS) region: string;
  @IsOptional() @IsEmail({}, { message: 'must be an e-mail address' }) contactEmail?: string | null;
  @Notes notes?: string | null;
}

export class ThreadSpecDto {
  @Code @Matches(THREAD_CODE_PATTERN, { message: THREAD_CODE_SAYS }) code: string;
  @OneOf(THREAD_FAMILIES) family: string;
  @Name(40) nominalLabel: string;
  @Mm(1000) majorDiameterMm: number;
  @Mm(50) pitchMm: number;
  @IsNumber(num, { message: NUMBER }) @Min(0.5) @Max(254) threadsPerInch: number;
  @IsNumber(num, { message: NUMBER }) @Min(1) @Max(179) flankAngleDeg: number;
  @OneOf(['tapered', 'parallel']) form: string;
  @Name(200) standard: string;
}

export class KeyCodeDto {
  @Code @Matches(KEY_CODE_PATTERN, { message: KEY_CODE_SAYS }) code: string;
  @Name() label: string;
  @IsOptional() @IsString() @MaxLength(200) marking?: string | null;
}

export class OpeningDto {
  @Name(DRUM.openingLabelChars) label: string;
  @Code threadCode: string;
  @Mm(DRUM.openingBoreMaxMm) boreMm: number;
  @IsOptional() @NullableCode keyCode?: string | null;
  @OneOf(['large', 'small', 'center', 'other']) position: string;
}

export class DrumTypeDto {
  @Id supplierId: string;
  @OneOf(REGIONS) region: string;
  @Name(DRUM.nameChars) name: string;
  @Name(DRUM.partNumberChars) partNumber: string;
  @IsNumber(num, { message: NUMBER })
  @Min(0.1, { message: 'must be more than 0 L' })
  @Max(DRUM.nominalCapacityMaxL, { message: `must be at most ${DRUM.nominalCapacityMaxL} L` })
  nominalCapacityL: number;
  @OneOf(['steel', 'plastic', 'fibre', 'aluminium', 'other']) material: string;
  @OneOf(['tight', 'open']) head: string;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @IsString() @MaxLength(DRUM.unPackagingCodeChars) unPackagingCode?: string | null;
  @Mm(DRUM.outsideHeightMaxMm) outsideHeightMm: number;
  @Mm(DRUM.insideDepthMaxMm) insideDepthMm: number;
  @Mm(DRUM.outsideDiameterMaxMm) outsideDiameterMm: number;
  @ValidateNested({ each: true })
  @Type(() => OpeningDto)
  @ArrayMinSize(DRUM.openingsMin, { message: 'must list at least one opening' })
  @ArrayMaxSize(DRUM.openingsMax, { message: `must list at most ${DRUM.openingsMax} openings` })
  openings: OpeningDto[];
}

export class DipTubeDto {
  @Name(TUBE.partNumberChars) partNumber: string;
  @Id supplierId: string;
  @Code threadCode: string;
  @Mm(TUBE.lengthMaxMm) lengthMm: number;
  @Mm(TUBE.boreMaxMm) boreMm: number;
  @Mm(TUBE.odMaxMm) odMm: number;
  @Name(TUBE.materialChars) material: string;
  @IsOptional() @NullableCode keyCode?: string | null;
  @OneOf(['feed', 'feed-return']) channels: string;
}

export class ConnectorDto {
  @Name(60) partNumber: string;
  @Id supplierId: string;
  @IsOptional() @NullableCode keyCode?: string | null;
  @Mm(200) feedBoreMm: number;
  @Name(20) feedNominal: string;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @Mm(200) returnBoreMm?: number | null;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @Name(20) returnNominal?: string | null;
  @OneOf(['none', 'restricted', 'open']) returnPath: string;
  @OneOf(SUITED_TO) suitedTo: string;
  @Name(200) wettedMaterials: string;
}

export class PairingDto {
  @Id dipTubeId: string;
  @Id connectorId: string;
  @Notes notes?: string | null;
}

export class ReviewDto {
  @Optional() @IsString({ message: 'must be text' }) @MaxLength(2000) comment?: string;
}

export class RequiredCommentDto {
  @IsString({ message: 'must be text' }) @MinLength(3, { message: 'must say why (at least 3 characters)' }) @MaxLength(2000) comment: string;
}

export class SlurryDto {
  @Name() name: string;
  @Id supplierId: string;
  @OneOf(REGIONS) region: string;
  @Id drumTypeId: string;
  @IsBoolean({ message: 'must be true or false' }) foams: boolean;
  @IsBoolean({ message: 'must be true or false' }) shearSensitive: boolean;
  @IsNumber(num, { message: NUMBER }) @Min(0, { message: 'must be 0 or more' }) @Max(100, { message: 'must be at most 100' }) solidsWtPct: number;
  // Receiving (shared/acceptance): optional; null clears a value.
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsInt({ message: 'must be a whole number of days' })
  @Min(1, { message: 'must be at least 1 day' })
  @Max(3650, { message: 'must be at most 3650 days' })
  shelfLifeDays?: number | null;
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsInt({ message: 'must be a whole number of days' })
  @Min(0, { message: 'must be 0 days or more' })
  @Max(3650, { message: 'must be at most 3650 days' })
  minRemainingDays?: number | null;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @IsNumber(num, { message: NUMBER }) @Min(-50, { message: 'must be -50 °C or more' }) @Max(80, { message: 'must be at most 80 °C' }) storageMinC?:
    number | null;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @IsNumber(num, { message: NUMBER }) @Min(-50, { message: 'must be -50 °C or more' }) @Max(80, { message: 'must be at most 80 °C' }) storageMaxC?:
    number | null;
  @IsOptional() @IsBoolean({ message: 'must be true or false' }) certificateRequired?: boolean;
}

export class StationDto {
  @Name() name: string;
  @Name(60) bay: string;
  @OneOf(['two-opening', 'one-opening']) tapping: string;
  @OneOf(['pump', 'mechanical']) agitation: string;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @IsUUID('all', { message: 'must be an id' }) connectorId?: string | null;
  @IsNumber(num, { message: NUMBER }) @Min(0.01, { message: 'must be more than 0 L/min' }) @Max(2000, { message: 'must be at most 2000 L/min' }) flowLpm: number;
}

export class TubeSetDto {
  @Id stationId: string;
  @Name(40) label: string;
  @Id dipTubeId: string;
  /** New sets start in cleaning (they are rinsed before their first drum); later moves go through the rotation. */
  @Optional() @OneOf(['cleaning']) state?: string;
}

export class SettingsDto {
  @Optional() @Name() siteName?: string;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(0) @Max(500) tipClearanceMinMm?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(0.1) @Max(500) tipClearanceMaxMm?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(0) @Max(10) threadMatchToleranceMm?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(100) @Max(10000) laminarLimit?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(1) @Max(100) maxReturnVelocityRatio?: number;
  /** IANA name, checked against the runtime's zone list in the service. */
  @Optional() @IsString({ message: 'must be text' }) @MaxLength(64, { message: 'must be at most 64 characters' }) timeZone?: string;
  @IsInt({ message: 'is required: the version you last read' })
  @Min(1, { message: 'must be the version you last read' })
  @Max(2147483647, { message: 'must be the version you last read' })
  version: number;
}
