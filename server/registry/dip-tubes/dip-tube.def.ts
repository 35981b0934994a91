import { fieldError } from '../../common/errors';
import { dipTubeProblem } from '../../../shared/records/dip-tube';
import { DipTube, DrumType, Pairing, Supplier } from '../../entities';
import { byCode, filter, stamps } from '../common';
import { anId } from '../list-query';
import { ensureExists, pick, resolveKey, resolveThread } from '../refs';
import { DipTubeDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { DipTubeRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

export const dipTubeJson = (t: DipTube): Sent<DipTubeRecord> => ({
  ...stamps(t),
  ...copyOf(t, ['partNumber', 'supplierId', 'lengthMm', 'boreMm', 'odMm', 'material', 'channels']),
  supplierName: t.supplier?.name ?? null,
  threadCode: t.threadSpec?.code ?? null,
  keyCode: t.keyCode?.code ?? null,
});

export const dipTubeDef: ResourceDef<DipTube> = {
  path: 'dip-tubes',
  label: 'Dip tube',
  entity: DipTube,
  alias: 't',
  dto: DipTubeDto,
  joins: (qb) => qb.leftJoinAndSelect('t.supplier', 'sup').leftJoinAndSelect('t.threadSpec', 'th').leftJoinAndSelect('t.keyCode', 'k'),
  search: ["t.part_number || ' ' || t.material"],
  sorts: { partNumber: 't.partNumber', lengthMm: 't.lengthMm', thread: 'th.code', updatedAt: 't.updatedAt' },
  defaultSort: 'partNumber',
  filters: {
    thread: byCode('thread', 'th'),
    key: byCode('key', 'k'),
    supplierId: filter(anId, (qb, v) => qb.andWhere('t.supplier_id = :supplierId', { supplierId: v })),
  },
  toJson: dipTubeJson,
  toColumns: async (dto, { manager, existing }) => {
    if (dto.supplierId !== undefined) await ensureExists(manager, Supplier, dto.supplierId, 'supplierId', 'supplier');
    const cols: Partial<DipTube> = pick<DipTube>(dto, ['partNumber', 'supplierId', 'lengthMm', 'boreMm', 'odMm', 'material', 'channels']);
    const merged = { ...(existing as DipTube | undefined), ...cols };
    const problem = dipTubeProblem(merged);
    if (problem) throw fieldError(problem.field, problem.says);
    if (dto.threadCode !== undefined) cols.threadSpecId = (await resolveThread(manager, dto.threadCode, 'threadCode')).id;
    if (dto.keyCode !== undefined) cols.keyCodeId = await resolveKey(manager, dto.keyCode, 'keyCode');
    return cols;
  },
  detailExtras: async (t, m): Promise<Sent<Required<Pick<DipTubeRecord, 'fitsDrumTypes' | 'pairings'>>>> => ({
    // Drum types with an opening of this tube's thread (whether the length reaches is the fit check's job).
    fitsDrumTypes: (
      await m
        .getRepository(DrumType)
        .createQueryBuilder('d')
        .where('d.id IN (SELECT drum_type_id FROM drum_openings WHERE thread_spec_id = :tid)', { tid: t.threadSpecId })
        .orderBy('d.name')
        .limit(100)
        .getMany()
    ).map((d) => ({ id: d.id, name: d.name, partNumber: d.partNumber, insideDepthMm: d.insideDepthMm })),
    pairings: (await m.find(Pairing, { where: { dipTubeId: t.id }, relations: { connector: true } })).map((p) => ({
      id: p.id,
      status: p.status,
      connectorId: p.connectorId,
      connectorPartNumber: p.connector?.partNumber,
    })),
  }),
};
