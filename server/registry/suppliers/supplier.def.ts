import { Connector, DipTube, DrumType, Supplier } from '../../entities';
import { filter, region, stamps } from '../common';
import { pick } from '../refs';
import { SupplierDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { SupplierRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

export const supplierDef: ResourceDef<Supplier> = {
  path: 'suppliers',
  label: 'Supplier',
  entity: Supplier,
  alias: 's',
  dto: SupplierDto,
  joins: (qb) => qb,
  search: ['s.name', 's.contact_email'],
  sorts: { name: 's.name', region: 's.region', updatedAt: 's.updatedAt' },
  defaultSort: 'name',
  filters: { region: filter(region, (qb, v) => qb.andWhere('s.region = :region', { region: v })) },
  toJson: (s): Sent<SupplierRecord> => ({ ...stamps(s), ...copyOf(s, ['name', 'region', 'contactEmail', 'notes']) }),
  toColumns: async (dto) => pick<Supplier>(dto, ['name', 'region', 'contactEmail', 'notes']),
  detailExtras: async (s, m): Promise<Sent<Required<Pick<SupplierRecord, 'drumTypes' | 'dipTubes' | 'connectors'>>>> => ({
    drumTypes: await m.count(DrumType, { where: { supplierId: s.id } }),
    dipTubes: await m.count(DipTube, { where: { supplierId: s.id } }),
    connectors: await m.count(Connector, { where: { supplierId: s.id } }),
  }),
};
