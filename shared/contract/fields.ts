// Runtime lists of the fields some contract types always carry. The type makes each list name every required
// field of its type and nothing else, so a test can hold a real answer against the contract
// (tests/api/contract.test.ts): a serialiser that drops a field, or sends one the contract lacks, fails it.
import type { DrumTypeRecord, SettingsRecord, SupplierRecord, TubeSetRecord } from './records';
import type { ReceivingCheckRecord } from './receiving';
import type { UserRecord } from './users';

type RequiredKeys<T> = { [K in keyof T]-?: object extends Pick<T, K> ? never : K }[keyof T];
type Complete<T, K extends readonly PropertyKey[]> = Exclude<RequiredKeys<T>, K[number]> extends never ? unknown : { missing: Exclude<RequiredKeys<T>, K[number]> };

/** `fieldsOf<T>()([...])`: the list, checked to name each required field of T. */
export const fieldsOf =
  <T>() =>
  <const K extends readonly RequiredKeys<T>[]>(keys: K & Complete<T, K>): K =>
    keys;

const STAMPS = ['id', 'version', 'createdAt', 'updatedAt'] as const;

export const SUPPLIER_FIELDS = fieldsOf<SupplierRecord>()([...STAMPS, 'name', 'region', 'contactEmail', 'notes']);
export const TUBE_SET_FIELDS = fieldsOf<TubeSetRecord>()([
  ...STAMPS,
  'stationId',
  'stationName',
  'label',
  'dipTubeId',
  'dipTubePartNumber',
  'state',
  'lastRinsedAt',
  'lastRinsedById',
  'lastRinsedByName',
  'lastUsedAt',
  'currentLotNumber',
  'currentDrumSerial',
]);
export const DRUM_TYPE_FIELDS = fieldsOf<DrumTypeRecord>()([
  ...STAMPS,
  'supplierId',
  'supplierName',
  'region',
  'name',
  'partNumber',
  'nominalCapacityL',
  'material',
  'head',
  'unPackagingCode',
  'outsideHeightMm',
  'insideDepthMm',
  'outsideDiameterMm',
  'insideDiameterMm',
  'openings',
]);
export const RECEIVING_CHECK_FIELDS = fieldsOf<ReceivingCheckRecord>()([
  'id',
  'version',
  'lotNumber',
  'supplierId',
  'supplierName',
  'slurryId',
  'slurryName',
  'drumCount',
  'drumTypeId',
  'drumTypeName',
  'drumTypePartNumber',
  'drumDescription',
  'stationId',
  'stationName',
  'productionDate',
  'expiryDate',
  'temperatureIndicator',
  'verdict',
  'decision',
  'lotVerdict',
  'provisional',
  'result',
  'checkedById',
  'checkedByName',
  'checkedAt',
  'status',
  'holdReason',
  'heldByRules',
  'heldByName',
  'heldAt',
  'releasedByName',
  'releasedAt',
  'releaseComment',
]);
export const SETTINGS_FIELDS = fieldsOf<SettingsRecord>()([
  'id',
  'version',
  'siteName',
  'tipClearanceMinMm',
  'tipClearanceMaxMm',
  'threadMatchToleranceMm',
  'laminarLimit',
  'maxReturnVelocityRatio',
  'timeZone',
  'updatedAt',
]);
export const USER_FIELDS = fieldsOf<UserRecord>()(['id', 'email', 'name', 'role', 'active', 'lengthUnit', 'mailOff', 'mustChangePassword', 'theme']);
