import type { EntityManager } from 'typeorm';
import { DrumType, HardwareWarning, type ReceivingCheck, Slurry, Station } from '../entities';
import type { FitCheckService } from '../fit/fit-check.service';
import { notifyRoles, notifyUser } from '../notifications/notifications.service';
import type { LotDecision, LotVerdict } from '../../shared/dock/verdict';
import { needsForStations, orderLines, totalOrder, type StationNeed } from '../sourcing/hardware-needs';

/** "Lot X (2 drums, 55 gal steel…)": how notices and warnings name a lot. */
export async function lotWords(m: EntityManager, r: ReceivingCheck): Promise<string> {
  const drumType = r.drumTypeId ? await m.findOneBy(DrumType, { id: r.drumTypeId }) : null;
  return `Lot ${r.lotNumber} (${r.drumCount} drum${r.drumCount === 1 ? '' : 's'}${drumType ? `, ${drumType.name}` : ''})`;
}

/**
 * What putting a lot on hold (or in quarantine) raises, by hand or by the rules alike: a hardware warning
 * listing what to order (empty when the hardware fits), a notice to engineers and buyers, and for buyers
 * the hardware the site lacks. In the caller's transaction.
 */
export async function raiseHoldNotices(m: EntityManager, fit: FitCheckService, r: ReceivingCheck, reason: string, userId: string): Promise<void> {
  const what = await lotWords(m, r);
  const slurryRow = r.slurryId ? await m.findOneBy(Slurry, { id: r.slurryId }) : null;
  let needs: StationNeed[] = [];
  if (r.drumTypeId) {
    const stations = r.stationId ? await m.find(Station, { where: { id: r.stationId } }) : await m.find(Station, { order: { name: 'ASC' } });
    const slurry = slurryRow ? { name: slurryRow.name, foams: slurryRow.foams, shearSensitive: slurryRow.shearSensitive } : null;
    needs = (await needsForStations(m, fit, r.drumTypeId, stations, slurry)).filter((n) => n.verdict !== 'fits' || n.order.length > 0);
  }
  const state = r.status === 'quarantined' ? 'in quarantine' : 'on hold';
  const hardware = r.verdict === 'no-fit' ? 'no fitting hardware' : r.verdict === 'caution' ? 'fits only with caution' : 'the hardware fits';
  await m.save(
    m.create(HardwareWarning, {
      source: 'lot',
      receivingCheckId: r.id,
      sourcingPlanId: null,
      status: 'open',
      summary: `${what} is ${state} at the dock (${hardware}). ${reason}`.slice(0, 1000),
      needs: needs.length ? [{ stations: needs, order: totalOrder(needs) }] : [{ stations: [], order: [] }],
    }),
  );
  await notifyRoles(
    m,
    ['engineer', 'buyer'],
    { kind: 'lot-held', title: `${what} ${state}`, body: `${what} was put ${state} at the dock: ${reason}`.slice(0, 4000), link: `/receive/${r.id}` },
    userId,
  );
  // Buyers also hear what the site lacks, with what to order.
  if (needs.length) {
    await notifyRoles(
      m,
      ['buyer'],
      {
        kind: 'hardware-gap',
        title: `Hardware needed for ${what}`,
        body: `${what} is held because the site lacks fitting hardware. What to order:`,
        link: `/sourcing/warnings`,
        lines: orderLines(totalOrder(needs)),
      },
      userId,
    );
  }
}

const DECISION_WORDS = { accept: 'accept', caution: 'caution', hold: 'hold', quarantine: 'quarantine' } as const;

/**
 * A check made offline was judged otherwise by the server (the registry changed since the phone kept it, or
 * the phone's clock or copy was off): the clerk who made it and the engineers hear both verdicts.
 */
export async function noticeVerdictDiffers(
  m: EntityManager,
  r: ReceivingCheck,
  phone: { decision: LotDecision; verdict: string; sentence: string; madeAt: string },
  server: LotVerdict,
  userId: string,
): Promise<void> {
  const what = await lotWords(m, r);
  const notice = {
    kind: 'verdict-differs' as const,
    title: `${what}: the server's verdict differs from the phone's`,
    body: `Worked out on the phone with no network (${phone.madeAt}): ${DECISION_WORDS[phone.decision]}. ${phone.sentence} Recorded by the server: ${DECISION_WORDS[server.decision]}. ${server.sentence} The server's verdict is the one recorded; check the lot before its drums go further.`.slice(
      0,
      4000,
    ),
    link: `/receive/${r.id}`,
  };
  await notifyUser(m, userId, notice);
  await notifyRoles(m, ['engineer'], notice, userId);
}
