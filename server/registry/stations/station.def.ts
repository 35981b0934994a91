import { Connector, Station, TubeSet } from '../../entities';
import { stamps } from '../common';
import { ensureExists, pick } from '../refs';
import { StationDto } from '../registry.dto';
import type { ResourceDef } from '../resource';

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
  toJson: (s) => ({
    ...stamps(s),
    name: s.name,
    bay: s.bay,
    tapping: s.tapping,
    agitation: s.agitation,
    connectorId: s.connectorId,
    connectorPartNumber: s.connector?.partNumber ?? null,
    flowLpm: s.flowLpm,
  }),
  toColumns: async (dto, { manager }) => {
    if (dto.connectorId != null) await ensureExists(manager, Connector, dto.connectorId, 'connectorId', 'connector');
    return pick<Station>(dto, ['name', 'bay', 'tapping', 'agitation', 'connectorId', 'flowLpm']);
  },
  detailExtras: async (s, m) => ({
    tubeSets: (await m.find(TubeSet, { where: { stationId: s.id }, relations: { dipTube: true }, order: { label: 'ASC' } })).map((t) => ({
      id: t.id,
      label: t.label,
      state: t.state,
      dipTubePartNumber: t.dipTube?.partNumber ?? null,
      lastRinsedAt: t.lastRinsedAt,
      lastUsedAt: t.lastUsedAt,
    })),
  }),
};
