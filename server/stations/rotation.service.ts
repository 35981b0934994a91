import type { DataSource, EntityManager } from 'typeorm';
import { rinseCheck } from '../../shared/fit/rules';
import type { StationBoard } from '../../shared/contract/stations';
import { conflict, fieldError, notFound } from '../common/errors';
import { copyOf, nameOf, type Sent } from '../common/json';
import { CHANGE_OUT_RELATIONS, changeOutJson } from './change-out.json';
import { ChangeOut, ReceivingCheck, RinseLog, Station, TubeSet } from '../entities';
import { audit } from '../audit/audit';
import type { RinseDto, StandbyDto } from './rotation.dto';

/**
 * The three-set rotation at a drum position: online -> cleaning -> clean and ready -> standby -> online.
 * A set goes into a drum only after a rinse since its last drum; every move is one transaction.
 */
export class RotationService {
  constructor(private readonly ds: DataSource) {}

  private async lockSet(m: EntityManager, id: string, version?: number): Promise<TubeSet> {
    const set = await m.findOne(TubeSet, { where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!set) throw notFound('Tube set');
    if (version !== undefined && set.version !== version)
      throw conflict(`Someone else moved ${set.label} first; reload the station.`, { current: { id: set.id, state: set.state, version: set.version } });
    return set;
  }

  /** Cleaning -> clean and ready, with who rinsed it and when, in the rinse log. */
  async rinse(id: string, dto: RinseDto, userId: string): Promise<void> {
    await this.ds.transaction(async (m) => {
      const set = await this.lockSet(m, id);
      if (set.state !== 'cleaning') throw conflict(`${set.label} is ${set.state}; only a set taken out for cleaning is rinsed here.`);
      const now = new Date();
      set.state = 'ready';
      set.lastRinsedAt = now;
      set.lastRinsedById = userId;
      await m.save(set);
      await m.save(m.create(RinseLog, { tubeSetId: set.id, rinsedById: userId, rinsedAt: now, note: dto.note?.trim() || null }));
      await audit(m, { userId, action: 'rinse', entity: 'tube-sets', entityId: set.id, summary: `${set.label} rinsed with DI water`, before: { state: 'cleaning' }, after: { state: 'ready' } });
    });
  }

  /** Clean and ready -> standby: the set is threaded into the next drum. Refused without a rinse since its last drum. */
  async standby(id: string, dto: StandbyDto, userId: string): Promise<void> {
    await this.ds.transaction(async (m) => {
      const set = await this.lockSet(m, id, dto.version);
      if (set.state !== 'ready') throw conflict(`${set.label} is ${set.state}; only a clean and ready set goes into the standby drum.`);
      const rinse = rinseCheck({ lastRinsedAt: set.lastRinsedAt, lastUsedAt: set.lastUsedAt });
      if (rinse.outcome !== 'pass') throw conflict(rinse.message, { rule: rinse });
      const taken = await m.findOneBy(TubeSet, { stationId: set.stationId, state: 'standby' });
      if (taken) throw conflict(`${taken.label} is already in the standby drum; change out first.`);
      let lotNumber = dto.lotNumber?.trim() || null;
      if (dto.receivingCheckId) {
        const check = await m.findOneBy(ReceivingCheck, { id: dto.receivingCheckId });
        if (!check) throw fieldError('receivingCheckId', 'does not name a recorded lot');
        if (check.status === 'on-hold') throw conflict(`Lot ${check.lotNumber} is on hold at the dock and cannot be tapped.`);
        lotNumber = check.lotNumber;
      }
      set.state = 'standby';
      set.lastUsedAt = new Date();
      set.currentReceivingCheckId = dto.receivingCheckId ?? null;
      set.currentLotNumber = lotNumber;
      set.currentDrumSerial = dto.drumSerial?.trim() || null;
      await m.save(set);
      await audit(m, {
        userId,
        action: 'standby',
        entity: 'tube-sets',
        entityId: set.id,
        summary: `${set.label} into the standby drum${lotNumber ? ` (lot ${lotNumber})` : ''}`,
        before: { state: 'ready' },
        after: { state: 'standby', lotNumber },
      });
    });
  }

  /**
   * The online drum is empty: its set comes out for cleaning (rinse at once), the standby drum goes online
   * with its set, and the change-out is recorded with the lot, drum, set and head.
   */
  async changeOut(stationId: string, userId: string): Promise<void> {
    await this.ds.transaction(async (m) => {
      const station = await m.findOne(Station, { where: { id: stationId }, lock: { mode: 'pessimistic_write' } });
      if (!station) throw notFound('Station');
      const sets = await m.find(TubeSet, { where: { stationId }, lock: { mode: 'pessimistic_write' } });
      const standby = sets.find((s) => s.state === 'standby');
      if (!standby) throw conflict(`${station.name} has no set in a standby drum; put a clean and ready set into the next drum first.`);
      const online = sets.find((s) => s.state === 'online');
      const now = new Date();
      if (online) {
        online.state = 'cleaning';
        online.lastUsedAt = now;
        online.currentLotNumber = null;
        online.currentDrumSerial = null;
        online.currentReceivingCheckId = null;
        await m.save(online);
      }
      standby.state = 'online';
      standby.lastUsedAt = now;
      await m.save(standby);
      await m.save(
        m.create(ChangeOut, {
          stationId,
          tubeSetId: standby.id,
          dipTubeId: standby.dipTubeId,
          connectorId: station.connectorId,
          receivingCheckId: standby.currentReceivingCheckId,
          lotNumber: standby.currentLotNumber,
          drumSerial: standby.currentDrumSerial,
          retiredTubeSetId: online?.id ?? null,
          byId: userId,
          at: now,
        }),
      );
      await audit(m, {
        userId,
        action: 'change-out',
        entity: 'stations',
        entityId: stationId,
        summary: `${station.name}: ${standby.label} online${online ? `, ${online.label} out for cleaning` : ''}`,
        after: { online: standby.id, cleaning: online?.id ?? null, lotNumber: standby.currentLotNumber },
      });
    });
  }

  async board(stationId: string) {
    const station = await this.ds.getRepository(Station).findOne({ where: { id: stationId }, relations: { connector: true } });
    if (!station) throw notFound('Station');
    const [sets, changeOuts, rinses] = await Promise.all([
      this.ds.getRepository(TubeSet).find({ where: { stationId }, relations: { dipTube: true, lastRinsedBy: true }, order: { label: 'ASC' } }),
      this.ds.getRepository(ChangeOut).find({ where: { stationId }, relations: CHANGE_OUT_RELATIONS, order: { at: 'DESC' }, take: 100 }),
      this.ds
        .getRepository(RinseLog)
        .createQueryBuilder('r')
        .innerJoinAndSelect('r.tubeSet', 'ts')
        .innerJoinAndSelect('r.rinsedBy', 'u')
        .where('ts.station_id = :stationId', { stationId })
        .orderBy('r.rinsedAt', 'DESC')
        .limit(100)
        .getMany(),
    ]);
    return {
      station: { ...copyOf(station, ['id', 'version', 'name', 'bay', 'tapping', 'agitation', 'flowLpm', 'connectorId']), connectorPartNumber: station.connector?.partNumber ?? null },
      tubeSets: sets.map((s) => ({
        ...copyOf(s, ['id', 'version', 'label', 'state', 'dipTubeId', 'lastRinsedAt', 'lastUsedAt', 'currentLotNumber', 'currentDrumSerial', 'currentReceivingCheckId']),
        dipTubePartNumber: s.dipTube?.partNumber ?? null,
        lastRinsedByName: nameOf(s.lastRinsedBy),
        // Whether the set may go into the next drum, by the shared rinse rule.
        rinse: rinseCheck({ lastRinsedAt: s.lastRinsedAt, lastUsedAt: s.lastUsedAt }),
      })),
      changeOuts: changeOuts.map(changeOutJson),
      rinses: rinses.map((r) => ({ id: r.id, at: r.rinsedAt, tubeSetLabel: r.tubeSet?.label ?? null, byName: nameOf(r.rinsedBy), note: r.note })),
    } satisfies Sent<StationBoard>;
  }
}
