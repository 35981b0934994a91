import type { DataSource, EntityManager } from 'typeorm';
import type { Page } from '../../shared/contract/records';
import type { HardwareWarningRecord, SourcingPlanDetail, SourcingPlanRecord } from '../../shared/contract/sourcing';
import { conflict, fieldError, notFound } from '../common/errors';
import { copyOf, nameOf, type Sent } from '../common/json';
import { DrumType, HardwareWarning, SourcingPlan, Station, Supplier } from '../entities';
import type { FitCheckService } from '../fit/fit-check.service';
import { notifyRoles } from '../notifications/notifications.service';
import { ensureExists } from '../registry/refs';
import { needsForStations, orderLines, stationsByIds, totalOrder } from './hardware-needs';
import type { SourcingPlanDto } from './sourcing.dto';

export const planJson = (p: SourcingPlan) =>
  ({
    ...copyOf(p, ['id', 'version', 'slurryName', 'supplierId', 'drumTypeId', 'startDate', 'drumsPerMonth', 'stationIds', 'foams', 'shearSensitive', 'notes', 'createdAt']),
    supplierName: p.supplier?.name ?? null,
    region: p.supplier?.region ?? null,
    drumTypeName: p.drumType?.name ?? null,
    drumTypePartNumber: p.drumType?.partNumber ?? null,
    createdByName: nameOf(p.createdBy),
  }) satisfies Sent<SourcingPlanRecord>;

export const warningJson = (w: HardwareWarning) =>
  ({
    ...copyOf(w, ['id', 'version', 'source', 'sourcingPlanId', 'receivingCheckId', 'status', 'summary', 'acknowledgedAt', 'resolvedAt', 'createdAt']),
    lotNumber: w.receivingCheck?.lotNumber ?? null,
    planSlurryName: w.sourcingPlan?.slurryName ?? null,
    // jsonb, as written with the warning.
    needs: w.needs as HardwareWarningRecord['needs'],
    acknowledgedByName: nameOf(w.acknowledgedBy),
    resolvedByName: nameOf(w.resolvedBy),
  }) satisfies Sent<HardwareWarningRecord>;

type Impact = Awaited<ReturnType<SourcingService['impactOf']>>;

/** Buying from a new source: which stations the new drum would reach, whether they fit, what to order. */
export class SourcingService {
  constructor(
    private readonly ds: DataSource,
    private readonly fit: FitCheckService,
  ) {}

  private async impactOf(m: EntityManager, plan: Pick<SourcingPlan, 'drumTypeId' | 'stationIds' | 'slurryName' | 'foams' | 'shearSensitive'>) {
    const stations = await stationsByIds(m, plan.stationIds);
    const slurry = { name: plan.slurryName, foams: plan.foams, shearSensitive: plan.shearSensitive };
    const needs = await needsForStations(m, this.fit, plan.drumTypeId, stations, slurry);
    return { stations: needs, order: totalOrder(needs), lacking: needs.filter((n) => n.verdict !== 'fits' || n.order.length > 0) };
  }

  async create(dto: SourcingPlanDto, userId: string) {
    // Read and judged before the transaction, so that the fit checks run as prepared statements (inside a
    // transaction each would be planned afresh); the plan, its warning and the notices are written together.
    const r = this.ds.manager;
    const supplier = await ensureExists(r, Supplier, dto.supplierId, 'supplierId', 'supplier');
    const drum = await ensureExists(r, DrumType, dto.drumTypeId, 'drumTypeId', 'drum type');
    const stationIds = dto.stationIds ?? (await r.find(Station, { select: { id: true } })).map((s) => s.id);
    const found = await stationsByIds(r, stationIds);
    if (found.length !== new Set(stationIds).size) throw fieldError('stationIds', 'names a station that does not exist');
    const fields = {
      slurryName: dto.slurryName.trim(),
      supplierId: supplier.id,
      drumTypeId: drum.id,
      startDate: dto.startDate,
      drumsPerMonth: dto.drumsPerMonth,
      stationIds: [...new Set(stationIds)],
      foams: dto.foams ?? false,
      shearSensitive: dto.shearSensitive ?? false,
      notes: dto.notes?.trim() || null,
      createdById: userId,
    };
    const impact = await this.impactOf(r, fields);
    const id = await this.ds.transaction(async (m) => {
      const plan = await m.save(m.create(SourcingPlan, fields));
      // A warning and the buyers' notices are written with the plan: all or nothing.
      if (impact.lacking.length) {
        const summary = `${plan.slurryName} from ${supplier.name} (${supplier.region}) from ${plan.startDate} arrives in ${drum.name}: ${impact.lacking.length} of ${impact.stations.length} station(s) need hardware.`;
        await m.save(
          m.create(HardwareWarning, { source: 'plan', sourcingPlanId: plan.id, receivingCheckId: null, status: 'open', summary, needs: [{ stations: impact.lacking, order: impact.order }] }),
        );
        await notifyRoles(m, ['buyer'], {
          kind: 'hardware-gap',
          title: `Hardware needed for ${plan.slurryName}`,
          body: `${summary} What to order:`,
          link: `/sourcing/${plan.id}`,
          lines: [...impact.lacking.map((n) => `${n.stationName}: ${n.summary}`), ...orderLines(impact.order)],
        });
      }
      return plan.id;
    });
    // The answer shows the impact just worked out, not worked out again.
    return this.detail(id, impact);
  }

  async list() {
    const plans = await this.ds.getRepository(SourcingPlan).find({ relations: { supplier: true, drumType: true, createdBy: true }, order: { createdAt: 'DESC' }, take: 200 });
    return { items: plans.map(planJson), total: plans.length, page: 1, pageSize: plans.length } satisfies Sent<Page<SourcingPlanRecord>>;
  }

  async detail(id: string, known?: Impact) {
    const plan = await this.ds.getRepository(SourcingPlan).findOne({ where: { id }, relations: { supplier: true, drumType: true, createdBy: true } });
    if (!plan) throw notFound('Sourcing plan');
    const impact = known ?? (await this.impactOf(this.ds.manager, plan));
    const warnings = await this.ds.getRepository(HardwareWarning).find({ where: { sourcingPlanId: id }, order: { createdAt: 'DESC' } });
    return { ...planJson(plan), impact: { stations: impact.stations, order: impact.order }, warnings: warnings.map(warningJson) } satisfies Sent<SourcingPlanDetail>;
  }

  async warnings(status?: string) {
    const rows = await this.ds.getRepository(HardwareWarning).find({
      where: status ? { status: status as HardwareWarning['status'] } : {},
      relations: { receivingCheck: true, sourcingPlan: true, acknowledgedBy: true, resolvedBy: true },
      order: { createdAt: 'DESC' },
      take: 200,
    });
    return { items: rows.map(warningJson), total: rows.length, page: 1, pageSize: rows.length } satisfies Sent<Page<HardwareWarningRecord>>;
  }

  async moveWarning(id: string, to: 'acknowledged' | 'resolved', userId: string) {
    await this.ds.transaction(async (m) => {
      const w = await m.findOne(HardwareWarning, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!w) throw notFound('Warning');
      if (w.status === 'resolved') throw conflict('This warning is already resolved.');
      if (to === 'acknowledged' && w.status !== 'open') throw conflict('Only an open warning can be acknowledged.');
      w.status = to;
      if (to === 'acknowledged') {
        w.acknowledgedById = userId;
        w.acknowledgedAt = new Date();
      } else {
        w.resolvedById = userId;
        w.resolvedAt = new Date();
      }
      await m.save(w);
    });
    const w = await this.ds.getRepository(HardwareWarning).findOneOrFail({ where: { id }, relations: { receivingCheck: true, sourcingPlan: true, acknowledgedBy: true, resolvedBy: true } });
    return warningJson(w);
  }
}
