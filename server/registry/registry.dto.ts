import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsBoolean,
  IsEmail,
  IsIn,
  IsInt,
  IsNumber,
  IsPositive,
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
import { CONNECTOR_LIMITS as HEAD, RETURN_PATHS } from '../../shared/records/connector';
import { DIP_TUBE_LIMITS as TUBE, TUBE_CHANNELS } from '../../shared/records/dip-tube';
import { DRUM_HEADS, DRUM_MATERIALS, DRUM_TYPE_LIMITS as DRUM, OPENING_POSITIONS } from '../../shared/records/drum-type';
import { CODE_CHARS, FIELD_SAYS as SAYS } from '../../shared/records/field';
import { PAIRING_LIMITS as PAIRING } from '../../shared/records/pairing';
import { SETTINGS_LIMITS as SETTINGS } from '../../shared/records/settings';
import { OXIDISERS, propertyBoundSays, SLURRY_LIMITS as SLURRY, SLURRY_PROPERTY_LIMITS, SLURRY_SAYS, VISCOSITY_MODELS, type SlurryPropertyField } from '../../shared/records/slurry';
import { AGITATIONS, STATION_LIMITS as STATION, TAPPINGS } from '../../shared/records/station';
import { SUPPLIER_LIMITS as SUPPLIER } from '../../shared/records/supplier';
import { TUBE_SET_LIMITS as TUBE_SET } from '../../shared/records/tube-set';
import { REGIONS, SUITED_TO, THREAD_FAMILIES } from '../entities/registry';

// Shared field rules; each record's limits are in shared/records/<record>.ts, the rules' words in shared/records/field.ts.
const num = { allowNaN: false, allowInfinity: false };
const NUMBER = SAYS.number;
/** What a thread code and a key code may hold; the list filters check the same forms. */
export const THREAD_CODE_PATTERN = /^[A-Za-z0-9][A-Za-z0-9/.\-x ]*$/;
export const THREAD_CODE_SAYS = 'may hold letters, digits, / . - and x';
export const KEY_CODE_PATTERN = /^[A-Za-z0-9][A-Za-z0-9\-_]*$/;
export const KEY_CODE_SAYS = 'may hold letters, digits, - and _';
const Mm = (max: number) => (target: object, key: string) => {
  IsNumber(num, { message: NUMBER })(target, key);
  Min(0.1, { message: SAYS.moreThanZero('mm') })(target, key);
  Max(max, { message: SAYS.atMost(max, 'mm') })(target, key);
};
const Name =
  (max = 120) =>
  (target: object, key: string) => {
    IsString({ message: SAYS.text })(target, key);
    MinLength(1, { message: SAYS.required })(target, key);
    MaxLength(max, { message: SAYS.atMost(max, 'characters') })(target, key);
  };
const Code = (target: object, key: string) => {
  IsString({ message: SAYS.text })(target, key);
  MaxLength(CODE_CHARS, { message: SAYS.atMost(CODE_CHARS, 'characters') })(target, key);
};
const Notes = (max: number) => (target: object, key: string) => {
  IsOptional()(target, key);
  IsString({ message: SAYS.text })(target, key);
  MaxLength(max, { message: SAYS.atMost(max, 'characters') })(target, key);
};
const Id = (target: object, key: string) => IsUUID('all', { message: SAYS.id })(target, key);
const OneOf = (values: readonly string[]) => IsIn(values, { message: SAYS.oneOf(values) });
/** A nullable reference by code: null clears it, a string must be a known code (checked by the service). */
const NullableCode = (target: object, key: string) => {
  ValidateIf((_o, v) => v !== null)(target, key);
  Code(target, key);
};

export class SupplierDto {
  @Name(SUPPLIER.nameChars) name: string;
  @OneOf(REGIONS) region: string;
  @IsOptional() @IsEmail({}, { message: 'must be an e-mail address' }) contactEmail?: string | null;
  @Notes(SUPPLIER.notesChars) notes?: string | null;
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
  @OneOf(OPENING_POSITIONS) position: string;
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
  @OneOf(DRUM_MATERIALS) material: string;
  @OneOf(DRUM_HEADS) head: string;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @IsString() @MaxLength(DRUM.unPackagingCodeChars) unPackagingCode?: string | null;
  @Mm(DRUM.outsideHeightMaxMm) outsideHeightMm: number;
  @Mm(DRUM.insideDepthMaxMm) insideDepthMm: number;
  @Mm(DRUM.outsideDiameterMaxMm) outsideDiameterMm: number;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @Mm(DRUM.outsideDiameterMaxMm) insideDiameterMm?: number | null;
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
  @OneOf(TUBE_CHANNELS) channels: string;
}

export class ConnectorDto {
  @Name(HEAD.partNumberChars) partNumber: string;
  @Id supplierId: string;
  @IsOptional() @NullableCode keyCode?: string | null;
  @Mm(HEAD.feedBoreMaxMm) feedBoreMm: number;
  @Name(HEAD.nominalChars) feedNominal: string;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @Mm(HEAD.returnBoreMaxMm) returnBoreMm?: number | null;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @Name(HEAD.nominalChars) returnNominal?: string | null;
  @OneOf(RETURN_PATHS) returnPath: string;
  @OneOf(SUITED_TO) suitedTo: string;
  @Name(HEAD.wettedMaterialsChars) wettedMaterials: string;
}

export class PairingDto {
  @Id dipTubeId: string;
  @Id connectorId: string;
  @Notes(PAIRING.notesChars) notes?: string | null;
}

export class ReviewDto {
  @Optional() @IsString({ message: 'must be text' }) @MaxLength(2000) comment?: string;
}

export class RequiredCommentDto {
  @IsString({ message: 'must be text' }) @MinLength(3, { message: 'must say why (at least 3 characters)' }) @MaxLength(2000) comment: string;
}

/** An optional slurry temperature in °C; null clears it. Registered in the order a stack of decorators would be (bottom first). */
const StorageC = (target: object, key: string) => {
  Max(SLURRY.storageMaxC, { message: SAYS.atMost(SLURRY.storageMaxC, '°C') })(target, key);
  Min(SLURRY.storageMinC, { message: `must be ${SLURRY.storageMinC} °C or more` })(target, key);
  IsNumber(num, { message: NUMBER })(target, key);
  ValidateIf((_o, v) => v !== null)(target, key);
  IsOptional()(target, key);
};

/** An optional slurry property (null clears it), inside its bounds in shared/records/slurry.ts. */
const Property = (field: SlurryPropertyField) => (target: object, key: string) => {
  const l = SLURRY_PROPERTY_LIMITS[field];
  Max(l.max, { message: propertyBoundSays(field, 'max') })(target, key);
  // Every bound that refuses its own value is 0 (SLURRY_PROPERTY_LIMITS).
  if (l.above) IsPositive({ message: propertyBoundSays(field, 'min') })(target, key);
  else Min(l.min, { message: propertyBoundSays(field, 'min') })(target, key);
  IsNumber(num, { message: NUMBER })(target, key);
  ValidateIf((_o, v) => v !== null)(target, key);
  IsOptional()(target, key);
};
const OptionalOneOf = (values: readonly string[]) => (target: object, key: string) => {
  IsIn(values, { message: SAYS.oneOf(values) })(target, key);
  ValidateIf((_o, v) => v !== null)(target, key);
  IsOptional()(target, key);
};

export class SlurryDto {
  @Name(SLURRY.nameChars) name: string;
  @Id supplierId: string;
  @OneOf(REGIONS) region: string;
  @Id drumTypeId: string;
  @IsBoolean({ message: 'must be true or false' }) foams: boolean;
  @IsBoolean({ message: 'must be true or false' }) shearSensitive: boolean;
  @IsNumber(num, { message: NUMBER })
  @Min(SLURRY.solidsMinPct, { message: `must be ${SLURRY.solidsMinPct} or more` })
  @Max(SLURRY.solidsMaxPct, { message: `must be at most ${SLURRY.solidsMaxPct}` })
  solidsWtPct: number;
  // Receiving (shared/acceptance): optional; null clears a value.
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsInt({ message: SLURRY_SAYS.wholeDays })
  @Min(SLURRY.shelfLifeMinDays, { message: `must be at least ${SLURRY.shelfLifeMinDays} day` })
  @Max(SLURRY.daysMax, { message: SAYS.atMost(SLURRY.daysMax, 'days') })
  shelfLifeDays?: number | null;
  @IsOptional()
  @ValidateIf((_o, v) => v !== null)
  @IsInt({ message: SLURRY_SAYS.wholeDays })
  @Min(SLURRY.remainingMinDays, { message: `must be ${SLURRY.remainingMinDays} days or more` })
  @Max(SLURRY.daysMax, { message: SAYS.atMost(SLURRY.daysMax, 'days') })
  minRemainingDays?: number | null;
  @StorageC storageMinC?: number | null;
  @StorageC storageMaxC?: number | null;
  @IsOptional() @IsBoolean({ message: 'must be true or false' }) certificateRequired?: boolean;
  // Its own properties: optional, null clears a value.
  @Property('densityKgM3') densityKgM3?: number | null;
  @OptionalOneOf(VISCOSITY_MODELS) viscosityModel?: string | null;
  @Property('viscosityMPaS') viscosityMPaS?: number | null;
  @Property('consistencyPaSn') consistencyPaSn?: number | null;
  @Property('flowIndex') flowIndex?: number | null;
  @Property('particleSizeNm') particleSizeNm?: number | null;
  @Property('minVelocityMs') minVelocityMs?: number | null;
  @Property('maxVelocityMs') maxVelocityMs?: number | null;
  @Property('maxWallShearPerS') maxWallShearPerS?: number | null;
  @Property('minTurnovers') minTurnovers?: number | null;
  @Property('minRecircMinutes') minRecircMinutes?: number | null;
  @Property('phMin') phMin?: number | null;
  @Property('phMax') phMax?: number | null;
  @OptionalOneOf(OXIDISERS) oxidiser?: string | null;
  @Property('solventWtPct') solventWtPct?: number | null;
}

/** An optional length of the station's transfer line (null clears it). */
const OptionalLine = (max: number, unit: string, positive: boolean) => (target: object, key: string) => {
  Max(max, { message: SAYS.atMost(max, unit) })(target, key);
  if (positive) IsPositive({ message: SAYS.moreThanZero(unit) })(target, key);
  else Min(0, { message: `must be 0 ${unit} or more` })(target, key);
  IsNumber(num, { message: NUMBER })(target, key);
  ValidateIf((_o, v) => v !== null)(target, key);
  IsOptional()(target, key);
};

export class StationDto {
  @Name(STATION.nameChars) name: string;
  @Name(STATION.bayChars) bay: string;
  @OneOf(TAPPINGS) tapping: string;
  @OneOf(AGITATIONS) agitation: string;
  @IsOptional() @ValidateIf((_o, v) => v !== null) @IsUUID('all', { message: 'must be an id' }) connectorId?: string | null;
  @IsNumber(num, { message: NUMBER })
  @Min(STATION.flowMinLpm, { message: SAYS.moreThanZero('L/min') })
  @Max(STATION.flowMaxLpm, { message: SAYS.atMost(STATION.flowMaxLpm, 'L/min') })
  flowLpm: number;
  @OptionalLine(STATION.lineLengthMaxM, 'm', true) lineLengthM?: number | null;
  @OptionalLine(STATION.lineBoreMaxMm, 'mm', true) lineBoreMm?: number | null;
  @OptionalLine(STATION.lineRoughnessMaxUm, 'µm', false) lineRoughnessUm?: number | null;
}

export class TubeSetDto {
  @Id stationId: string;
  @Name(TUBE_SET.labelChars) label: string;
  @Id dipTubeId: string;
  /** New sets start in cleaning (they are rinsed before their first drum); later moves go through the rotation. */
  @Optional() @OneOf(['cleaning']) state?: string;
}

export class SettingsDto {
  @Optional() @Name(SETTINGS.siteNameChars) siteName?: string;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(SETTINGS.tipClearanceMinFromMm) @Max(SETTINGS.tipClearanceUpToMm) tipClearanceMinMm?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(SETTINGS.tipClearanceMaxFromMm) @Max(SETTINGS.tipClearanceUpToMm) tipClearanceMaxMm?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(0) @Max(SETTINGS.threadMatchToleranceUpToMm) threadMatchToleranceMm?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(SETTINGS.laminarLimitFrom) @Max(SETTINGS.laminarLimitUpTo) laminarLimit?: number;
  @Optional() @IsNumber(num, { message: NUMBER }) @Min(SETTINGS.returnVelocityRatioFrom) @Max(SETTINGS.returnVelocityRatioUpTo) maxReturnVelocityRatio?: number;
  /** IANA name, checked against the runtime's zone list in the service (shared/records/settings.ts). */
  @Optional()
  @IsString({ message: SAYS.text })
  @MaxLength(SETTINGS.timeZoneChars, { message: SAYS.atMost(SETTINGS.timeZoneChars, 'characters') })
  timeZone?: string;
  @IsInt({ message: 'is required: the version you last read' })
  @Min(1, { message: 'must be the version you last read' })
  @Max(2147483647, { message: 'must be the version you last read' })
  version: number;
}
