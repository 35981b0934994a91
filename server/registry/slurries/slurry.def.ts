import { SLURRY_PROPERTY_KEYS, slurryProblem } from '../../../shared/records/slurry';
import { fieldError } from '../../common/errors';
import { DrumType, Slurry, Supplier } from '../../entities';
import { filter, region, stamps } from '../common';
import { anId } from '../list-query';
import { ensureExists, pick } from '../refs';
import { SlurryDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { SlurryRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

export const slurryDef: ResourceDef<Slurry> = {
  path: 'slurries',
  label: 'Slurry',
  entity: Slurry,
  alias: 'sl',
  dto: SlurryDto,
  joins: (qb) => qb.leftJoinAndSelect('sl.supplier', 'sup').leftJoinAndSelect('sl.drumType', 'd'),
  search: ['sl.name', 'sup.name', 'd.name'],
  sorts: { name: 'sl.name', region: 'sl.region', updatedAt: 'sl.updatedAt' },
  defaultSort: 'name',
  filters: {
    region: filter(region, (qb, v) => qb.andWhere('sl.region = :region', { region: v })),
    supplierId: filter(anId, (qb, v) => qb.andWhere('sl.supplier_id = :supplierId', { supplierId: v })),
  },
  toJson: (s): Sent<SlurryRecord> => ({
    ...stamps(s),
    ...copyOf(s, [
      'name',
      'supplierId',
      'region',
      'drumTypeId',
      'foams',
      'shearSensitive',
      'solidsWtPct',
      'shelfLifeDays',
      'minRemainingDays',
      'storageMinC',
      'storageMaxC',
      'certificateRequired',
      ...SLURRY_PROPERTY_KEYS,
    ]),
    supplierName: s.supplier?.name ?? null,
    drumTypeName: s.drumType?.name ?? null,
  }),
  toColumns: async (dto, { manager, existing }) => {
    if (dto.supplierId !== undefined) await ensureExists(manager, Supplier, dto.supplierId, 'supplierId', 'supplier');
    if (dto.drumTypeId !== undefined) await ensureExists(manager, DrumType, dto.drumTypeId, 'drumTypeId', 'drum type');
    const cols = pick<Slurry>(dto, [
      'name',
      'supplierId',
      'region',
      'drumTypeId',
      'foams',
      'shearSensitive',
      'solidsWtPct',
      'shelfLifeDays',
      'minRemainingDays',
      'storageMinC',
      'storageMaxC',
      'certificateRequired',
      ...SLURRY_PROPERTY_KEYS,
    ]);
    const problem = slurryProblem({ ...(existing as Slurry | undefined), ...cols });
    if (problem) throw fieldError(problem.field, problem.says);
    return cols;
  },
};
