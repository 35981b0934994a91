import type { ObjectLiteral } from 'typeorm';
import type { ThreadSpecRow } from '../../shared/threads/thread-table';
import { fieldError } from '../common/errors';
import { parseDto } from '../common/validate';
import { Connector, DipTube, DrumOpening, DrumType, KeyCode, Pairing, PairingReview, Slurry, Station, Supplier, ThreadSpec, TubeSet } from '../entities';
import { notifyRoles } from '../notifications/notifications.service';
import { PAIRING_STATUSES, REGIONS, SUITED_TO, THREAD_FAMILIES, TUBE_SET_STATES } from '../entities/registry';
import { anId, codeLike, oneOf, type ListFilter } from './list-query';
import { ensureExists, pick, resolveKey, resolveThread } from './refs';
import {
  KEY_CODE_PATTERN,
  KEY_CODE_SAYS,
  THREAD_CODE_PATTERN,
  THREAD_CODE_SAYS,
  ConnectorDto,
  DipTubeDto,
  DrumTypeDto,
  KeyCodeDto,
  OpeningDto,
  PairingDto,
  SlurryDto,
  StationDto,
  SupplierDto,
  ThreadSpecDto,
  TubeSetDto,
} from './registry.dto';
import type { ResourceDef, WriteContext } from './resource';

type Dto = Record<string, unknown>;
const stamps = (e: { id: string; version: number; createdAt: Date; updatedAt: Date }) => ({ id: e.id, version: e.version, createdAt: e.createdAt, updatedAt: e.updatedAt });
// The rules of each filter value; a value outside its rule is a 400 naming the parameter, not an empty list.
const region = oneOf(REGIONS);
const threadCode = codeLike(THREAD_CODE_PATTERN, `must be a thread code (it ${THREAD_CODE_SAYS})`);
const keyCode = codeLike(KEY_CODE_PATTERN, `must be a key code (it ${KEY_CODE_SAYS})`);
const filter = <E extends ObjectLiteral>(rule: ListFilter<E>['rule'], apply: ListFilter<E>['apply']): ListFilter<E> => ({ rule, apply });
/** A filter on the code of a joined thread spec or key code. */
const byCode = <E extends ObjectLiteral>(param: 'thread' | 'key', relation: string): ListFilter<E> =>
  filter(param === 'thread' ? threadCode : keyCode, (qb, value) => qb.andWhere(`${relation}.code = :${param}`, { [param]: value }));

/** A stored thread spec as a row of the thread table (the shape the shared thread code works on). */
export const threadRow = (t: ThreadSpec): ThreadSpecRow => ({
  code: t.code,
  family: t.family,
  nominalLabel: t.nominalLabel,
  majorDiameterMm: t.majorDiameterMm,
  pitchMm: t.pitchMm,
  threadsPerInch: t.threadsPerInch,
  flankAngleDeg: t.flankAngleDeg,
  form: t.form,
  standard: t.standard,
});

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
  toJson: (s) => ({ ...stamps(s), name: s.name, region: s.region, contactEmail: s.contactEmail, notes: s.notes }),
  toColumns: async (dto) => pick<Supplier>(dto, ['name', 'region', 'contactEmail', 'notes']),
  detailExtras: async (s, m) => ({
    drumTypes: await m.count(DrumType, { where: { supplierId: s.id } }),
    dipTubes: await m.count(DipTube, { where: { supplierId: s.id } }),
    connectors: await m.count(Connector, { where: { supplierId: s.id } }),
  }),
};

export const threadSpecDef: ResourceDef<ThreadSpec> = {
  path: 'thread-specs',
  label: 'Thread spec',
  entity: ThreadSpec,
  alias: 't',
  dto: ThreadSpecDto,
  joins: (qb) => qb,
  search: ['t.code', 't.nominal_label', 't.standard'],
  sorts: { code: 't.code', family: 't.family', majorDiameterMm: 't.majorDiameterMm' },
  defaultSort: 'majorDiameterMm',
  // On the thread table, ?thread= is the family.
  filters: { thread: filter(oneOf(THREAD_FAMILIES), (qb, v) => qb.andWhere('t.family = :family', { family: v })) },
  toJson: (t) => ({ ...stamps(t), ...threadRow(t) }),
  toColumns: async (dto) => pick<ThreadSpec>(dto, ['code', 'family', 'nominalLabel', 'majorDiameterMm', 'pitchMm', 'threadsPerInch', 'flankAngleDeg', 'form', 'standard']),
};

export const keyCodeDef: ResourceDef<KeyCode> = {
  path: 'key-codes',
  label: 'Key code',
  entity: KeyCode,
  alias: 'k',
  dto: KeyCodeDto,
  joins: (qb) => qb,
  search: ['k.code', 'k.label', "coalesce(k.marking, '')"],
  sorts: { code: 'k.code', label: 'k.label' },
  defaultSort: 'code',
  toJson: (k) => ({ ...stamps(k), code: k.code, label: k.label, marking: k.marking }),
  toColumns: async (dto) => pick<KeyCode>(dto, ['code', 'label', 'marking']),
};

const openingJson = (o: DrumOpening) => ({ id: o.id, label: o.label, threadCode: o.threadSpec?.code ?? null, boreMm: o.boreMm, keyCode: o.keyCode?.code ?? null, position: o.position });

export const drumTypeJson = (d: DrumType) => ({
  ...stamps(d),
  supplierId: d.supplierId,
  supplierName: d.supplier?.name ?? null,
  region: d.region,
  name: d.name,
  partNumber: d.partNumber,
  nominalCapacityL: d.nominalCapacityL,
  material: d.material,
  head: d.head,
  unPackagingCode: d.unPackagingCode,
  outsideHeightMm: d.outsideHeightMm,
  insideDepthMm: d.insideDepthMm,
  outsideDiameterMm: d.outsideDiameterMm,
  openings: [...(d.openings ?? [])].sort((a, b) => a.label.localeCompare(b.label)).map(openingJson),
});

/** Replaces a drum type's openings, each validated in full and its codes resolved (inside the caller's transaction). */
async function writeOpenings(drum: DrumType, dto: Dto, { manager }: WriteContext): Promise<void> {
  if (dto.openings === undefined) return;
  if (!Array.isArray(dto.openings) || dto.openings.length === 0) throw fieldError('openings', 'must list at least one opening');
  const labels = new Set<string>();
  const rows: Partial<DrumOpening>[] = [];
  for (const [i, raw] of dto.openings.entries()) {
    const o = await parseDto(OpeningDto, { ...(raw as object) }).catch((err) => {
      throw prefixFields(err, `openings.${i}`);
    });
    if (labels.has(o.label)) throw fieldError(`openings.${i}.label`, 'must be different from the other openings');
    labels.add(o.label);
    const thread = await resolveThread(manager, o.threadCode, `openings.${i}.threadCode`);
    rows.push({
      drumTypeId: drum.id,
      label: o.label,
      threadSpecId: thread.id,
      boreMm: o.boreMm,
      keyCodeId: await resolveKey(manager, o.keyCode, `openings.${i}.keyCode`),
      position: o.position as DrumOpening['position'],
    });
  }
  await manager.delete(DrumOpening, { drumTypeId: drum.id });
  for (const row of rows) await manager.save(manager.create(DrumOpening, row));
}

function prefixFields(err: unknown, prefix: string): unknown {
  const e = err as { details?: Array<{ field: string }> };
  if (Array.isArray(e.details)) for (const d of e.details) d.field = `${prefix}.${d.field}`;
  return err;
}

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
    ]);
    const merged = { ...(existing as DrumType | undefined), ...cols };
    if (merged.insideDepthMm! >= merged.outsideHeightMm!) throw fieldError('insideDepthMm', 'must be less than the outside height');
    return cols;
  },
  afterWrite: writeOpenings,
  detailExtras: async (d, m) => ({
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

export const dipTubeJson = (t: DipTube) => ({
  ...stamps(t),
  partNumber: t.partNumber,
  supplierId: t.supplierId,
  supplierName: t.supplier?.name ?? null,
  threadCode: t.threadSpec?.code ?? null,
  lengthMm: t.lengthMm,
  boreMm: t.boreMm,
  odMm: t.odMm,
  material: t.material,
  keyCode: t.keyCode?.code ?? null,
  channels: t.channels,
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
    if (merged.boreMm! >= merged.odMm!) throw fieldError('boreMm', 'must be smaller than the outside diameter');
    if (dto.threadCode !== undefined) cols.threadSpecId = (await resolveThread(manager, dto.threadCode, 'threadCode')).id;
    if (dto.keyCode !== undefined) cols.keyCodeId = await resolveKey(manager, dto.keyCode, 'keyCode');
    return cols;
  },
  detailExtras: async (t, m) => ({
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

export const connectorJson = (c: Connector) => ({
  ...stamps(c),
  partNumber: c.partNumber,
  supplierId: c.supplierId,
  supplierName: c.supplier?.name ?? null,
  keyCode: c.keyCode?.code ?? null,
  feedBoreMm: c.feedBoreMm,
  feedNominal: c.feedNominal,
  returnBoreMm: c.returnBoreMm,
  returnNominal: c.returnNominal,
  returnPath: c.returnPath,
  suitedTo: c.suitedTo,
  wettedMaterials: c.wettedMaterials,
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
    const returnPath = cols.returnPath ?? (existing as Connector | undefined)?.returnPath;
    const returnBore = 'returnBoreMm' in cols ? cols.returnBoreMm : (existing as Connector | undefined)?.returnBoreMm;
    if (returnPath === 'none' && returnBore != null) throw fieldError('returnBoreMm', 'must be empty when the head has no return path');
    if (returnPath !== 'none' && returnBore == null) throw fieldError('returnBoreMm', 'is required when the head has a return path');
    return cols;
  },
  detailExtras: async (c, m) => ({
    stations: (await m.find(Station, { where: { connectorId: c.id }, order: { name: 'ASC' } })).map((s) => ({ id: s.id, name: s.name, bay: s.bay, tapping: s.tapping })),
    pairings: (await m.find(Pairing, { where: { connectorId: c.id }, relations: { dipTube: true } })).map((p) => ({
      id: p.id,
      status: p.status,
      dipTubeId: p.dipTubeId,
      dipTubePartNumber: p.dipTube?.partNumber,
    })),
  }),
};

export const pairingJson = (p: Pairing) => ({
  ...stamps(p),
  dipTubeId: p.dipTubeId,
  dipTubePartNumber: p.dipTube?.partNumber ?? null,
  threadCode: p.dipTube?.threadSpec?.code ?? null,
  connectorId: p.connectorId,
  connectorPartNumber: p.connector?.partNumber ?? null,
  status: p.status,
  authorId: p.authorId,
  authorName: p.author?.displayName ?? null,
  approverId: p.approverId,
  approverName: p.approver?.displayName ?? null,
  approvedAt: p.approvedAt,
  notes: p.notes,
});

export const pairingDef: ResourceDef<Pairing> = {
  path: 'pairings',
  label: 'Pairing',
  entity: Pairing,
  alias: 'p',
  dto: PairingDto,
  joins: (qb) =>
    qb
      .leftJoinAndSelect('p.dipTube', 'pt')
      .leftJoinAndSelect('pt.threadSpec', 'ptt')
      .leftJoinAndSelect('pt.keyCode', 'ptk')
      .leftJoinAndSelect('p.connector', 'pc')
      .leftJoinAndSelect('p.author', 'pa')
      .leftJoinAndSelect('p.approver', 'pv'),
  search: ['pt.part_number', 'pc.part_number', "coalesce(p.notes, '')"],
  sorts: { status: 'p.status', updatedAt: 'p.updatedAt', dipTube: 'pt.partNumber', connector: 'pc.partNumber' },
  defaultSort: 'updatedAt',
  filters: {
    status: filter(oneOf(PAIRING_STATUSES), (qb, v) => qb.andWhere('p.status = :status', { status: v })),
    thread: byCode('thread', 'ptt'),
    key: byCode('key', 'ptk'),
  },
  toJson: pairingJson,
  toColumns: async (dto, { manager, user, existing }) => {
    if (existing) {
      if (dto.dipTubeId !== undefined || dto.connectorId !== undefined)
        throw fieldError(dto.dipTubeId !== undefined ? 'dipTubeId' : 'connectorId', 'cannot change; retire this pairing and create a new one');
      return pick<Pairing>(dto, ['notes']);
    }
    await ensureExists(manager, DipTube, dto.dipTubeId, 'dipTubeId', 'dip tube');
    await ensureExists(manager, Connector, dto.connectorId, 'connectorId', 'connector');
    return { ...pick<Pairing>(dto, ['dipTubeId', 'connectorId', 'notes']), status: 'draft', authorId: user.id, approverId: null, approvedAt: null };
  },
  // A new draft asks the other engineers for a review (in the same transaction as the pairing).
  afterWrite: async (p, _dto, { manager, user, existing }) => {
    if (existing) return;
    const full = await manager.findOne(Pairing, { where: { id: p.id }, relations: { dipTube: true, connector: true } });
    const what = `${full?.dipTube?.partNumber} with ${full?.connector?.partNumber}`;
    await notifyRoles(
      manager,
      ['engineer'],
      {
        kind: 'pairing-review',
        title: `Pairing ${what} awaits review`,
        body: `${user.displayName} registered the pairing of ${what}; an engineer other than the author approves or rejects it.`,
        link: `/registry/pairings/${p.id}`,
      },
      user.id,
    );
  },
  detailExtras: async (p, m) => ({
    reviews: (await m.find(PairingReview, { where: { pairingId: p.id }, relations: { reviewer: true }, order: { createdAt: 'ASC' } })).map((r) => ({
      id: r.id,
      decision: r.decision,
      comment: r.comment,
      reviewerId: r.reviewerId,
      reviewerName: r.reviewer?.displayName ?? null,
      at: r.createdAt,
    })),
  }),
};

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
  toColumns: async (dto, { manager }) => {
    if (dto.supplierId !== undefined) await ensureExists(manager, Supplier, dto.supplierId, 'supplierId', 'supplier');
    if (dto.drumTypeId !== undefined) await ensureExists(manager, DrumType, dto.drumTypeId, 'drumTypeId', 'drum type');
    return pick<Slurry>(dto, [
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
  },
};

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

export const tubeSetDef: ResourceDef<TubeSet> = {
  path: 'tube-sets',
  label: 'Tube set',
  entity: TubeSet,
  alias: 'ts',
  dto: TubeSetDto,
  joins: (qb) => qb.leftJoinAndSelect('ts.station', 'st').leftJoinAndSelect('ts.dipTube', 't').leftJoinAndSelect('ts.lastRinsedBy', 'rb'),
  search: ['ts.label', 'st.name', 't.part_number'],
  sorts: { label: 'ts.label', station: 'st.name', state: 'ts.state', lastRinsedAt: 'ts.lastRinsedAt' },
  defaultSort: 'station',
  filters: {
    stationId: filter(anId, (qb, v) => qb.andWhere('ts.station_id = :stationId', { stationId: v })),
    // On tube sets, ?status= is the set's state in the rotation.
    status: filter(oneOf(TUBE_SET_STATES), (qb, v) => qb.andWhere('ts.state = :state', { state: v })),
  },
  toJson: (t) => ({
    ...stamps(t),
    currentLotNumber: t.currentLotNumber,
    currentDrumSerial: t.currentDrumSerial,
    stationId: t.stationId,
    stationName: t.station?.name ?? null,
    label: t.label,
    dipTubeId: t.dipTubeId,
    dipTubePartNumber: t.dipTube?.partNumber ?? null,
    state: t.state,
    lastRinsedAt: t.lastRinsedAt,
    lastRinsedById: t.lastRinsedById,
    lastRinsedByName: t.lastRinsedBy?.displayName ?? null,
    lastUsedAt: t.lastUsedAt,
  }),
  toColumns: async (dto, { manager, existing }) => {
    if (dto.stationId !== undefined) await ensureExists(manager, Station, dto.stationId, 'stationId', 'station');
    if (dto.dipTubeId !== undefined) await ensureExists(manager, DipTube, dto.dipTubeId, 'dipTubeId', 'dip tube');
    const cols = pick<TubeSet>(dto, ['stationId', 'label', 'dipTubeId']);
    if (existing) {
      if (dto.state !== undefined && dto.state !== (existing as TubeSet).state) throw fieldError('state', 'changes through the rotation: rinse, standby and change-out');
      if (dto.stationId !== undefined && dto.stationId !== (existing as TubeSet).stationId) throw fieldError('stationId', 'cannot change; register a new set at the other station');
      return cols;
    }
    return { ...cols, state: 'cleaning', lastRinsedAt: null, lastUsedAt: null };
  },
};

export const RESOURCES = [supplierDef, threadSpecDef, keyCodeDef, drumTypeDef, dipTubeDef, connectorDef, pairingDef, slurryDef, stationDef, tubeSetDef] as unknown as ResourceDef<ObjectLiteral>[];
