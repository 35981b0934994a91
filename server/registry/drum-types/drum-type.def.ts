import { fieldError } from '../../common/errors';
import { drumTypeProblem } from '../../../shared/records/drum-type';
import { DrumType, Pairing, Slurry, Supplier } from '../../entities';
import { filter, region, stamps, threadCode, keyCode } from '../common';
import { anId } from '../list-query';
import { ensureExists, pick } from '../refs';
import { DrumTypeDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import { openingJson, writeOpenings } from './openings';
import type { DrumTypeRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

export const drumTypeJson = (d: DrumType): Sent<DrumTypeRecord> => ({
  ...stamps(d),
  ...copyOf(d, ['supplierId', 'region', 'name', 'partNumber', 'nominalCapacityL', 'material', 'head', 'unPackagingCode', 'outsideHeightMm', 'insideDepthMm', 'outsideDiameterMm', 'insideDiameterMm']),
  supplierName: d.supplier?.name ?? null,
  openings: [...(d.openings ?? [])].sort((a, b) => a.label.localeCompare(b.label)).map(openingJson),
});

export const drumTypeDef: ResourceDef<DrumType> = {
  path: 'drum-types',
  label: 'Drum type',
  entity: DrumType,
  alias: 'd',
  dto: DrumTypeDto,
  joins: (qb) => qb.leftJoinAndSelect('d.supplier', 'sup').leftJoinAndSelect('d.openings', 'o').leftJoinAndSelect('o.threadSpec', 'ot').leftJoinAndSelect('o.keyCode', 'ok'),
  search: ['d.name', 'd.part_number', 'sup.name'],
  sorts: { name: 'd.name', partNumber: 'd.partNumber', region: 'd.region', insideDepthMm: 'd.insideDepthMm', nominalCapacityL: 'd.nominalCapacityL', updatedAt: 'd.updatedAt' },
  defaultSort: 'name',
  filters: {
    region: filter(region, (qb, v) => qb.andWhere('d.region = :region', { region: v })),
    supplierId: filter(anId, (qb, v) => qb.andWhere('d.supplier_id = :supplierId', { supplierId: v })),
    thread: filter(threadCode, (qb, v) =>
      qb.andWhere('d.id IN (SELECT fo.drum_type_id FROM drum_openings fo JOIN thread_specs ft ON ft.id = fo.thread_spec_id WHERE ft.code = :thread)', { thread: v }),
    ),
    key: filter(keyCode, (qb, v) => qb.andWhere('d.id IN (SELECT fo.drum_type_id FROM drum_openings fo JOIN key_codes fk ON fk.id = fo.key_code_id WHERE fk.code = :key)', { key: v })),
  },
  toJson: drumTypeJson,
  toColumns: async (dto, { manager, existing }) => {
    if (dto.supplierId !== undefined) await ensureExists(manager, Supplier, dto.supplierId, 'supplierId', 'supplier');
    const cols = pick<DrumType>(dto, [
      'supplierId',
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
    ]);
    const merged = { ...(existing as DrumType | undefined), ...cols };
    const problem = drumTypeProblem(merged);
    if (problem) throw fieldError(problem.field, problem.says);
    return cols;
  },
  afterWrite: writeOpenings,
  detailExtras: async (d, m): Promise<Sent<Required<Pick<DrumTypeRecord, 'pairings' | 'slurries'>>>> => ({
    // Pairings whose tube threads into one of this drum's openings.
    pairings: await m
      .getRepository(Pairing)
      .createQueryBuilder('p')
      .innerJoinAndSelect('p.dipTube', 'pt')
      .innerJoinAndSelect('pt.threadSpec', 'ptt')
      .innerJoinAndSelect('p.connector', 'pc')
      .where('pt.thread_spec_id IN (SELECT thread_spec_id FROM drum_openings WHERE drum_type_id = :id)', { id: d.id })
      .orderBy('p.status', 'ASC')
      .limit(100)
      .getMany()
      .then((ps) =>
        ps.map((p) => ({
          id: p.id,
          status: p.status,
          dipTubeId: p.dipTubeId,
          dipTubePartNumber: p.dipTube?.partNumber,
          threadCode: p.dipTube?.threadSpec?.code,
          connectorId: p.connectorId,
          connectorPartNumber: p.connector?.partNumber,
        })),
      ),
    slurries: (await m.find(Slurry, { where: { drumTypeId: d.id }, order: { name: 'ASC' } })).map((s) => ({ id: s.id, name: s.name })),
  }),
};
