import type { DataSource } from 'typeorm';
import { conflict, fieldError, notFound, ValidationFailed } from '../common/errors';
import { ChangeOut, DrumType, HardwareWarning, ReceivingCheck, Slurry, Station, Supplier } from '../entities';
import { FitCheckService } from '../fit/fit-check.service';
import { notifyRoles } from '../notifications/notifications.service';
import { ensureExists } from '../registry/refs';
import { needsForStation, orderLines, totalOrder, type StationNeed } from '../sourcing/hardware-needs';
import { audit } from '../audit/audit';
import type { HoldDto, ReceivingCheckDto, ReceivingListDto, ReleaseDto } from './receiving.dto';

const RELATIONS = { supplier: true, slurry: true, drumType: true, station: true, checkedBy: true, heldBy: true, releasedBy: true } as const;

export const receivingJson = (r: ReceivingCheck) => ({
  id: r.id,
  version: r.version,
  lotNumber: r.lotNumber,
  supplierId: r.supplierId,
  supplierName: r.supplier?.name ?? null,
  slurryId: r.slurryId,
  slurryName: r.slurry?.name ?? null,
  drumCount: r.drumCount,
  drumTypeId: r.drumTypeId,
  drumTypeName: r.drumType?.name ?? null,
  drumTypePartNumber: r.drumType?.partNumber ?? null,
  drumDescription: r.drumDescription,
  stationId: r.stationId,
  stationName: r.station?.name ?? null,
  verdict: r.verdict,
  result: r.result,
  checkedById: r.checkedById,
  checkedByName: r.checkedBy?.displayName ?? null,
  checkedAt: r.createdAt,
  status: r.status,
  holdReason: r.holdReason,
  heldByName: r.heldBy?.displayName ?? null,
  heldAt: r.heldAt,
  releasedByName: r.releasedBy?.displayName ?? null,
  releasedAt: r.releasedAt,
  releaseComment: r.releaseComment,
});

/** The dock: a lot's drums checked against the site's hardware, recorded, and held when they do not fit. */
export class ReceivingService {
  private readonly fit: FitCheckService;

  constructor(private readonly ds: DataSource) {
    this.fit = new FitCheckService(ds);
  }

  async create(dto: ReceivingCheckDto, userId: string) {
    if (!dto.drumTypeId === !dto.drum) {
      throw new ValidationFailed([{ field: dto.drumTypeId ? 'drum' : 'drumTypeId', messages: ['pick a drum type or describe the drum, not both'] }]);
    }
    const m = this.ds.manager;
    if (dto.supplierId) await ensureExists(m, Supplier, dto.supplierId, 'supplierId', 'supplier');
    if (dto.stationId) await ensureExists(m, Station, dto.stationId, 'stationId', 'station');
    if (dto.slurryId) await ensureExists(m, Slurry, dto.slurryId, 'slurryId', 'slurry');
    // The same authoritative check the API offers, run with what the clerk entered.
    const result = await this.fit.check({ drumTypeId: dto.drumTypeId, drum: dto.drum, slurryId: dto.slurryId, stationId: dto.stationId });
    const saved = await m.save(
      m.create(ReceivingCheck, {
        lotNumber: dto.lotNumber.trim(),
        supplierId: dto.supplierId ?? null,
        slurryId: dto.slurryId ?? null,
        drumCount: dto.drumCount,
        drumTypeId: dto.drumTypeId ?? null,
        drumDescription: dto.drum ? { ...dto.drum } : null,
        stationId: dto.stationId ?? null,
        verdict: result.verdict,
        result: result as unknown as Record<string, unknown>,
        checkedById: userId,
        status: 'checked',
      }),
    );
    return this.detail(saved.id);
  }

  async list(q: ReceivingListDto) {
    const page = q.page ?? 1;
    const pageSize = q.pageSize ?? 25;
    const qb = this.ds
      .getRepository(ReceivingCheck)
      .createQueryBuilder('r')
      .leftJoinAndSelect('r.supplier', 'supplier')
      .leftJoinAndSelect('r.slurry', 'slurry')
      .leftJoinAndSelect('r.drumType', 'drumType')
      .leftJoinAndSelect('r.station', 'station')
      .leftJoinAndSelect('r.checkedBy', 'checkedBy');
    if (q.q?.trim()) qb.andWhere('r.lot_number ILIKE :q', { q: `%${q.q.trim().replace(/[\\%_]/g, (c) => `\\${c}`)}%` });
    if (q.verdict) qb.andWhere('r.verdict = :verdict', { verdict: q.verdict });
    if (q.status) qb.andWhere('r.status = :status', { status: q.status });
    if (q.from) qb.andWhere('r.created_at >= :from::date', { from: q.from });
    if (q.to) qb.andWhere("r.created_at < (:to::date + interval '1 day')", { to: q.to });
    qb.orderBy('r.createdAt', 'DESC').skip((page - 1) * pageSize).take(pageSize);
    const [rows, total] = await qb.getManyAndCount();
    // The stored result is large; the history list needs only the verdict and summary.
    return { items: rows.map((r) => ({ ...receivingJson(r), result: { summary: (r.result as { summary?: string }).summary ?? '' } })), total, page, pageSize };
  }

  async detail(id: string) {
    const r = await this.ds.getRepository(ReceivingCheck).findOne({ where: { id }, relations: RELATIONS });
    if (!r) throw notFound('Receiving check');
    const changeOuts = await this.ds.getRepository(ChangeOut).find({
      where: [{ receivingCheckId: id }],
      relations: { station: true, tubeSet: true, dipTube: true, connector: true, by: true },
      order: { at: 'ASC' },
    });
    return {
      ...receivingJson(r),
      // Every piece of hardware that touched this lot, in order.
      changeOuts: changeOuts.map((c) => ({
        id: c.id,
        at: c.at,
        stationId: c.stationId,
        stationName: c.station?.name ?? null,
        tubeSetId: c.tubeSetId,
        tubeSetLabel: c.tubeSet?.label ?? null,
        dipTubePartNumber: c.dipTube?.partNumber ?? null,
        connectorPartNumber: c.connector?.partNumber ?? null,
        drumSerial: c.drumSerial,
        byName: c.by?.displayName ?? null,
      })),
    };
  }

  /** Holding a lot tells engineers and buyers, and raises a hardware warning listing what to order. */
  async hold(id: string, dto: HoldDto, userId: string) {
    await this.ds.transaction(async (m) => {
      const r = await m.findOne(ReceivingCheck, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!r) throw notFound('Receiving check');
      const drumType = r.drumTypeId ? await m.findOneBy(DrumType, { id: r.drumTypeId }) : null;
      const slurryRow = r.slurryId ? await m.findOneBy(Slurry, { id: r.slurryId }) : null;
      if (r.verdict === 'fits') throw fieldError('reason', 'a lot that fits is not held here; record the reason with the lot instead');
      if (r.status === 'on-hold') throw conflict('This lot is already on hold.');
      r.status = 'on-hold';
      r.holdReason = dto.reason.trim();
      r.heldById = userId;
      r.heldAt = new Date();
      await m.save(r);
      await audit(m, { userId, action: 'hold', entity: 'receiving-checks', entityId: r.id, summary: `Lot ${r.lotNumber} put on hold: ${r.holdReason}`, after: { status: r.status, holdReason: r.holdReason } });

      const what = `Lot ${r.lotNumber} (${r.drumCount} drum${r.drumCount === 1 ? '' : 's'}${drumType ? `, ${drumType.name}` : ''})`;
      let needs: StationNeed[] = [];
      if (r.drumTypeId) {
        const stations = r.stationId ? await m.find(Station, { where: { id: r.stationId } }) : await m.find(Station, { order: { name: 'ASC' } });
        const slurry = slurryRow ? { name: slurryRow.name, foams: slurryRow.foams, shearSensitive: slurryRow.shearSensitive } : null;
        for (const s of stations) needs.push(await needsForStation(m, this.fit, r.drumTypeId, s, slurry));
        needs = needs.filter((n) => n.verdict !== 'fits' || n.order.length > 0);
      }
      await m.save(
        m.create(HardwareWarning, {
          source: 'lot',
          receivingCheckId: r.id,
          sourcingPlanId: null,
          status: 'open',
          summary: `${what} is on hold at the dock: ${r.verdict === 'no-fit' ? 'no fitting hardware' : 'fits only with caution'}. ${dto.reason.trim()}`,
          needs: needs.length ? [{ stations: needs, order: totalOrder(needs) }] : [{ stations: [], order: [] }],
        }),
      );
      await notifyRoles(
        m,
        ['engineer', 'buyer'],
        { kind: 'lot-held', title: `${what} on hold`, body: `${what} was put on hold at the dock: ${dto.reason.trim()}`, link: `/receive/${r.id}` },
        userId,
      );
      // Buyers also hear what the site lacks, with what to order.
      if (needs.length) {
        await notifyRoles(m, ['buyer'], {
          kind: 'hardware-gap',
          title: `Hardware needed for ${what}`,
          body: `${what} is held because the site lacks fitting hardware. What to order:`,
          link: `/sourcing/warnings`,
          lines: orderLines(totalOrder(needs)),
        }, userId);
      }
    });
    return this.detail(id);
  }

  async release(id: string, dto: ReleaseDto, userId: string) {
    await this.ds.transaction(async (m) => {
      const r = await m.findOne(ReceivingCheck, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!r) throw notFound('Receiving check');
      if (r.status !== 'on-hold') throw conflict('Only a lot on hold can be released.');
      r.status = 'released';
      r.releasedById = userId;
      r.releasedAt = new Date();
      r.releaseComment = dto.comment.trim();
      await m.save(r);
      await audit(m, { userId, action: 'release', entity: 'receiving-checks', entityId: r.id, summary: `Lot ${r.lotNumber} released: ${r.releaseComment}`, before: { status: 'on-hold' }, after: { status: r.status } });
    });
    return this.detail(id);
  }
}
