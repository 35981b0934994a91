import { Connector, Station, TubeSet } from '../../entities';
import { stamps } from '../common';
import { ensureExists, pick } from '../refs';
import { StationDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { StationRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

export const stationDef: ResourceDef<Station> = {
  path: 'stations',
  label: 'Station',
  entity: Station,
  alias: 'st',
  dto: StationDto,
  joins: (qb) => qb.leftJoinAndSelect('st.connector', 'c'),
  search: ['st.name', 'st.bay'],
  sorts: { name: 'st.name', bay: 'st.bay', updatedAt: 'st.updatedAt' },
  defaultSort: 'name',
  toJson: (s): Sent<StationRecord> => ({
    ...stamps(s),
    ...copyOf(s, ['name', 'bay', 'tapping', 'agitation', 'connectorId', 'flowLpm', 'lineLengthM', 'lineBoreMm', 'lineRoughnessUm']),
    connectorPartNumber: s.connector?.partNumber ?? null,
  }),
  toColumns: async (dto, { manager }) => {
    if (dto.connectorId != null) await ensureExists(manager, Connector, dto.connectorId, 'connectorId', 'connector');
    return pick<Station>(dto, ['name', 'bay', 'tapping', 'agitation', 'connectorId', 'flowLpm', 'lineLengthM', 'lineBoreMm', 'lineRoughnessUm']);
  },
  detailExtras: async (s, m): Promise<Sent<Required<Pick<StationRecord, 'tubeSets'>>>> => ({
    tubeSets: (await m.find(TubeSet, { where: { stationId: s.id }, relations: { dipTube: true }, order: { label: 'ASC' } })).map((t) => ({
      ...copyOf(t, ['id', 'label', 'state', 'lastRinsedAt', 'lastUsedAt']),
      dipTubePartNumber: t.dipTube?.partNumber ?? null,
    })),
  }),
};
