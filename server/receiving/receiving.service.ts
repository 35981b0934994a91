import { QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import { lotDateProblems } from '../../shared/acceptance/rules';
import { HELD_STATUSES } from '../../shared/contract/lot-status';
import { holdReasonOf, type FitForVerdict, type LotVerdict } from '../../shared/dock/verdict';
import { conflict, fieldError, notFound, ValidationFailed } from '../common/errors';
import { ChangeOut, HardwareWarning, ReceivingCheck, Supplier } from '../entities';
import type { FitCheckService } from '../fit/fit-check.service';
import { ensureExists } from '../registry/refs';
import { audit } from '../audit/audit';
import { noticeVerdictDiffers, raiseHoldNotices } from './hold-effects';
import { certificateAttached, decide, siteToday } from './lot-decision';
import type { HoldDto, ReceivingCheckDto, ReceivingListDto, ReleaseDto } from './receiving.dto';
import type { ReceivingCheckDetail, ReceivingCheckRow } from '../../shared/contract/receiving';
import type { Page } from '../../shared/contract/records';
import type { Sent } from '../common/json';
import { CHANGE_OUT_RELATIONS, changeOutJson } from '../stations/change-out.json';
import { receivingJson, receivingRowJson } from './receiving.json';

export { receivingJson };

const RELATIONS = { supplier: true, slurry: true, drumType: true, station: true, checkedBy: true, heldBy: true, releasedBy: true } as const;

const isClientKeyClash = (err: unknown) => err instanceof QueryFailedError && (err.driverError as { constraint?: string }).constraint === 'receiving_checks_client_key';

const HELD_AS = { hold: 'on-hold', quarantine: 'quarantined' } as const;

/**
 * The dock: a lot's drums checked against the site's hardware and the lot against its slurry's acceptance
 * rules, in one verdict. A lot the verdict holds or quarantines is recorded so at once, with the rules'
 * reasons and the same warning and notices a hold by hand raises.
 */
export class ReceivingService {
  constructor(
    private readonly ds: DataSource,
    private readonly fit: FitCheckService,
    private readonly clock: () => Date = () => new Date(),
  ) {}

  /**
   * A dock check. With a `clientKey` (a phone's key, sent again when the network comes back) the same key
   * records once: a replay answers the check already recorded, `replayed` set.
   */
  async create(dto: ReceivingCheckDto, userId: string): Promise<{ check: Awaited<ReturnType<ReceivingService['detail']>>; replayed: boolean }> {
    if (dto.clientKey) {
      const earlier = await this.byClientKey(dto.clientKey, userId);
      if (earlier) return { check: await this.detail(earlier), replayed: true };
    }
    try {
      return { check: await this.record(dto, userId), replayed: false };
    } catch (err) {
      // Two sends of one key at once: the unique index lets one through, the other answers it.
      const earlier = dto.clientKey && isClientKeyClash(err) ? await this.byClientKey(dto.clientKey, userId) : null;
      if (earlier) return { check: await this.detail(earlier), replayed: true };
      throw err;
    }
  }

  private async byClientKey(clientKey: string, userId: string): Promise<string | null> {
    const row = await this.ds.getRepository(ReceivingCheck).findOne({ where: { clientKey }, select: { id: true, checkedById: true } });
    if (row && row.checkedById !== userId) throw fieldError('clientKey', 'belongs to a check recorded by someone else');
    return row?.id ?? null;
  }

  private async record(dto: ReceivingCheckDto, userId: string) {
    if (!dto.drumTypeId === !dto.drum) {
      throw new ValidationFailed([{ field: dto.drumTypeId ? 'drum' : 'drumTypeId', messages: ['pick a drum type or describe the drum, not both'] }]);
    }
    const m = this.ds.manager;
    const today = await siteToday(m, this.clock());
    const dates = { productionDate: dto.productionDate ?? null, expiryDate: dto.expiryDate ?? null };
    const problems = lotDateProblems({ today, ...dates });
    if (Object.keys(problems).length) throw new ValidationFailed(Object.entries(problems).map(([field, message]) => ({ field, messages: [message] })));
    if (dto.supplierId) await ensureExists(m, Supplier, dto.supplierId, 'supplierId', 'supplier');
    // The same authoritative check the API offers, on the question already validated with the body (the fit
    // service names a station or slurry that does not exist), from the kept answers when it can be.
    const result = await this.fit.result({ drumTypeId: dto.drumTypeId, drum: dto.drum, slurryId: dto.slurryId, stationId: dto.stationId });
    const id = await this.ds.transaction(async (tx) => {
      const verdict = await decide(tx, {
        fit: result as FitForVerdict,
        slurryId: dto.slurryId ?? null,
        today,
        ...dates,
        temperatureIndicator: dto.temperatureIndicator ?? null,
        certificateAttached: false,
      });
      const held = verdict.decision === 'hold' || verdict.decision === 'quarantine';
      const saved = await tx.save(
        tx.create(ReceivingCheck, {
          clientKey: dto.clientKey ?? null,
          provisional: dto.provisional ? { ...dto.provisional } : null,
          lotNumber: dto.lotNumber.trim(),
          supplierId: dto.supplierId ?? null,
          slurryId: dto.slurryId ?? null,
          drumCount: dto.drumCount,
          drumTypeId: dto.drumTypeId ?? null,
          drumDescription: dto.drum ? { ...dto.drum } : null,
          stationId: dto.stationId ?? null,
          ...dates,
          temperatureIndicator: dto.temperatureIndicator ?? null,
          verdict: result.verdict,
          result: result as unknown as Record<string, unknown>,
          decision: verdict.decision,
          acceptance: verdict,
          checkedById: userId,
          status: held ? HELD_AS[verdict.decision as 'hold' | 'quarantine'] : 'checked',
          ...(held ? { holdReason: holdReasonOf(verdict).slice(0, 2000), heldById: userId, heldAt: this.clock(), heldByRules: true } : {}),
        }),
      );
      if (held) {
        await audit(tx, {
          userId,
          action: 'hold',
          entity: 'receiving-checks',
          entityId: saved.id,
          summary: `Lot ${saved.lotNumber} ${saved.status} by the rules: ${verdict.sentence}`,
          after: { status: saved.status, holdReason: saved.holdReason },
        });
        await raiseHoldNotices(tx, this.fit, saved, verdict.sentence, userId);
      }
      if (dto.provisional && (dto.provisional.decision !== verdict.decision || dto.provisional.verdict !== result.verdict)) {
        await noticeVerdictDiffers(tx, saved, dto.provisional, verdict, userId);
      }
      return saved.id;
    });
    return this.detail(id);
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
    qb.orderBy('r.createdAt', 'DESC')
      .skip((page - 1) * pageSize)
      .take(pageSize);
    const [rows, total] = await qb.getManyAndCount();
    return {
      items: rows.map(receivingRowJson),
      total,
      page,
      pageSize,
    } satisfies Sent<Page<ReceivingCheckRow>>;
  }

  async detail(id: string) {
    const r = await this.ds.getRepository(ReceivingCheck).findOne({ where: { id }, relations: RELATIONS });
    if (!r) throw notFound('Receiving check');
    const changeOuts = await this.ds.getRepository(ChangeOut).find({
      where: [{ receivingCheckId: id }],
      relations: CHANGE_OUT_RELATIONS,
      order: { at: 'ASC' },
    });
    return {
      ...receivingJson(r),
      // Every piece of hardware that touched this lot, in order.
      changeOuts: changeOuts.map(changeOutJson),
    } satisfies Sent<ReceivingCheckDetail>;
  }

  /** A hold by hand: for a lot the verdict did not hold but that fits only with caution, with a typed reason. */
  async hold(id: string, dto: HoldDto, userId: string) {
    await this.ds.transaction(async (m) => {
      const r = await m.findOne(ReceivingCheck, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!r) throw notFound('Receiving check');
      if (HELD_STATUSES.includes(r.status)) throw conflict(`This lot is already ${r.status === 'quarantined' ? 'in quarantine' : 'on hold'}.`);
      if (r.decision === 'accept') throw fieldError('reason', 'a lot that passes every rule is not held here; record the reason with the lot instead');
      r.status = 'on-hold';
      r.holdReason = dto.reason.trim();
      r.heldById = userId;
      r.heldAt = this.clock();
      r.heldByRules = false;
      await m.save(r);
      await audit(m, {
        userId,
        action: 'hold',
        entity: 'receiving-checks',
        entityId: r.id,
        summary: `Lot ${r.lotNumber} put on hold: ${r.holdReason}`,
        after: { status: r.status, holdReason: r.holdReason },
      });
      await raiseHoldNotices(m, this.fit, r, r.holdReason, userId);
    });
    return this.detail(id);
  }

  /** An engineer releases a held or quarantined lot, saying why (the route policy allows engineers only). */
  async release(id: string, dto: ReleaseDto, userId: string) {
    await this.ds.transaction(async (m) => {
      const r = await m.findOne(ReceivingCheck, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!r) throw notFound('Receiving check');
      if (!HELD_STATUSES.includes(r.status)) throw conflict('Only a lot on hold or in quarantine can be released.');
      const before = r.status;
      r.status = 'released';
      r.releasedById = userId;
      r.releasedAt = this.clock();
      r.releaseComment = dto.comment.trim();
      await m.save(r);
      await audit(m, {
        userId,
        action: 'release',
        entity: 'receiving-checks',
        entityId: r.id,
        summary: `Lot ${r.lotNumber} released: ${r.releaseComment}`,
        before: { status: before },
        after: { status: r.status },
      });
    });
    return this.detail(id);
  }

  /**
   * A certificate of analysis was attached: the lot is judged again (on the day it was checked) and a hold
   * the rules made is lifted when nothing else holds it. A hold typed by a person stays for a person.
   */
  async certificateAdded(m: EntityManager, id: string, userId: string): Promise<void> {
    const r = await m.findOne(ReceivingCheck, { where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!r || !r.acceptance) return;
    const verdict: LotVerdict = await decide(m, {
      fit: r.result as unknown as FitForVerdict,
      slurryId: r.slurryId,
      today: r.acceptance.today,
      productionDate: r.productionDate,
      expiryDate: r.expiryDate,
      temperatureIndicator: r.temperatureIndicator,
      certificateAttached: await certificateAttached(m, id),
    });
    r.acceptance = verdict;
    r.decision = verdict.decision;
    const lifted = r.status === 'on-hold' && r.heldByRules && verdict.decision !== 'hold' && verdict.decision !== 'quarantine';
    if (lifted) {
      r.status = 'released';
      r.releasedById = userId;
      r.releasedAt = this.clock();
      r.releaseComment = 'The certificate of analysis was attached, which lifts the certificate hold; no other rule holds the lot.';
    }
    await m.save(r);
    if (lifted) {
      await audit(m, {
        userId,
        action: 'release',
        entity: 'receiving-checks',
        entityId: r.id,
        summary: `Lot ${r.lotNumber} released: certificate of analysis attached`,
        before: { status: 'on-hold' },
        after: { status: r.status },
      });
      // The warning the hold opened was about the certificate alone: it is settled too.
      await m.update(HardwareWarning, { receivingCheckId: r.id, status: 'open' }, { status: 'resolved', resolvedById: userId, resolvedAt: this.clock() });
    }
  }
}
