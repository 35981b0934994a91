import { connectorProblem } from '../../../shared/records/connector';
import { fieldError } from '../../common/errors';
import { Connector, Pairing, Station, Supplier } from '../../entities';
import { SUITED_TO } from '../../entities/registry';
import { byCode, filter, stamps } from '../common';
import { anId, oneOf } from '../list-query';
import { ensureExists, pick, resolveKey } from '../refs';
import { ConnectorDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { ConnectorRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

export const connectorJson = (c: Connector): Sent<ConnectorRecord> => ({
  ...stamps(c),
  ...copyOf(c, ['partNumber', 'supplierId', 'feedBoreMm', 'feedNominal', 'returnBoreMm', 'returnNominal', 'returnPath', 'suitedTo', 'wettedMaterials']),
  supplierName: c.supplier?.name ?? null,
  keyCode: c.keyCode?.code ?? null,
});

export const connectorDef: ResourceDef<Connector> = {
  path: 'connectors',
  label: 'Dispense head',
  entity: Connector,
  alias: 'c',
  dto: ConnectorDto,
  joins: (qb) => qb.leftJoinAndSelect('c.supplier', 'sup').leftJoinAndSelect('c.keyCode', 'k'),
  search: ["c.part_number || ' ' || c.wetted_materials"],
  sorts: { partNumber: 'c.partNumber', feedBoreMm: 'c.feedBoreMm', suitedTo: 'c.suitedTo', updatedAt: 'c.updatedAt' },
  defaultSort: 'partNumber',
  filters: {
    key: byCode('key', 'k'),
    supplierId: filter(anId, (qb, v) => qb.andWhere('c.supplier_id = :supplierId', { supplierId: v })),
    // On connectors, ?status= is what the head is suited to.
    status: filter(oneOf(SUITED_TO), (qb, v) => qb.andWhere('c.suited_to = :suited', { suited: v })),
  },
  toJson: connectorJson,
  toColumns: async (dto, { manager, existing }) => {
    if (dto.supplierId !== undefined) await ensureExists(manager, Supplier, dto.supplierId, 'supplierId', 'supplier');
    const cols: Partial<Connector> = pick<Connector>(dto, ['partNumber', 'supplierId', 'feedBoreMm', 'feedNominal', 'returnBoreMm', 'returnNominal', 'returnPath', 'suitedTo', 'wettedMaterials']);
    if (dto.keyCode !== undefined) cols.keyCodeId = await resolveKey(manager, dto.keyCode, 'keyCode');
    const problem = connectorProblem({ ...(existing as Connector | undefined), ...cols });
    if (problem) throw fieldError(problem.field, problem.says);
    return cols;
  },
  detailExtras: async (c, m): Promise<Sent<Required<Pick<ConnectorRecord, 'stations' | 'pairings'>>>> => ({
    stations: (await m.find(Station, { where: { connectorId: c.id }, order: { name: 'ASC' } })).map((s) => ({ id: s.id, name: s.name, bay: s.bay, tapping: s.tapping })),
    pairings: (await m.find(Pairing, { where: { connectorId: c.id }, relations: { dipTube: true } })).map((p) => ({
      id: p.id,
      status: p.status,
      dipTubeId: p.dipTubeId,
      dipTubePartNumber: p.dipTube?.partNumber,
    })),
  }),
};
