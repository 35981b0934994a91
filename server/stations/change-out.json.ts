import type { ChangeOutRecord } from '../../shared/contract/stations';
import { copyOf, nameOf, type Sent } from '../common/json';
import type { ChangeOut } from '../entities';

/** The joins changeOutJson reads. */
export const CHANGE_OUT_RELATIONS = { station: true, tubeSet: true, dipTube: true, connector: true, by: true, retiredTubeSet: true } as const;

/** A change-out as the station board and the lot's page show it. */
export const changeOutJson = (c: ChangeOut): Sent<ChangeOutRecord> => ({
  ...copyOf(c, ['id', 'at', 'stationId', 'tubeSetId', 'lotNumber', 'receivingCheckId', 'drumSerial']),
  stationName: c.station?.name ?? null,
  tubeSetLabel: c.tubeSet?.label ?? null,
  dipTubePartNumber: c.dipTube?.partNumber ?? null,
  connectorPartNumber: c.connector?.partNumber ?? null,
  retiredTubeSetLabel: c.retiredTubeSet?.label ?? null,
  byName: nameOf(c.by),
});
