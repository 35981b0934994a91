import { slurryProblem } from '../../../shared/records/slurry';
import { fieldError } from '../../common/errors';
import { DrumType, Slurry, Supplier } from '../../entities';
import { filter, region, stamps } from '../common';
import { anId } from '../list-query';
import { ensureExists, pick } from '../refs';
import { SlurryDto } from '../registry.dto';
import type { ResourceDef } from '../resource';

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
  toJson: (s) => ({
    ...stamps(s),
    name: s.name,
    supplierId: s.supplierId,
    supplierName: s.supplier?.name ?? null,
    region: s.region,
    drumTypeId: s.drumTypeId,
    drumTypeName: s.drumType?.name ?? null,
    foams: s.foams,
    shearSensitive: s.shearSensitive,
    solidsWtPct: s.solidsWtPct,
    shelfLifeDays: s.shelfLifeDays,
    minRemainingDays: s.minRemainingDays,
    storageMinC: s.storageMinC,
    storageMaxC: s.storageMaxC,
    certificateRequired: s.certificateRequired,
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
    ]);
    const problem = slurryProblem({ ...(existing as Slurry | undefined), ...cols });
    if (problem) throw fieldError(problem.field, problem.says);
    return cols;
  },
};
