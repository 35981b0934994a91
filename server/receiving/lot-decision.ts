import type { EntityManager } from 'typeorm';
import { localDate } from '../../shared/dates';
import type { LotAcceptanceInput, SlurryAcceptance, TemperatureIndicator } from '../../shared/acceptance/types';
import { decideLot, type FitForVerdict, type LotVerdict } from '../../shared/dock/verdict';
import { Attachment, Slurry } from '../entities';
import { loadSettings } from '../settings/settings.service';

export const slurryAcceptance = (s: Slurry): SlurryAcceptance => ({
  name: s.name,
  shelfLifeDays: s.shelfLifeDays,
  minRemainingDays: s.minRemainingDays,
  storageMinC: s.storageMinC,
  storageMaxC: s.storageMaxC,
  certificateRequired: s.certificateRequired,
});

/** The site's local date at `now`: the day lot expiry is judged on. */
export async function siteToday(m: EntityManager, now: Date): Promise<string> {
  return localDate(now, (await loadSettings(m)).timeZone);
}

export async function certificateAttached(m: EntityManager, checkId: string): Promise<boolean> {
  return m.exists(Attachment, { where: { ownerKind: 'receiving-check', ownerId: checkId, purpose: 'certificate' } });
}

/**
 * Gathers what the shared decision reads (the slurry's registry record, the stations with the best head)
 * and makes it: one call on shared/dock, the same the phone makes offline.
 */
export async function decide(
  m: EntityManager,
  args: {
    fit: FitForVerdict & { candidates: Array<{ connectorId?: string }> };
    slurryId: string | null;
    today: string;
    productionDate: string | null;
    expiryDate: string | null;
    temperatureIndicator: TemperatureIndicator | null;
    certificateAttached: boolean;
  },
): Promise<LotVerdict> {
  const slurry = args.slurryId ? await m.findOneBy(Slurry, { id: args.slurryId }) : null;
  const best = args.fit.candidates[0];
  const stations: Array<{ name: string }> = best?.connectorId && !args.fit.station ? await m.query(`SELECT name FROM stations WHERE connector_id = $1 ORDER BY name`, [best.connectorId]) : [];
  const lot: LotAcceptanceInput = {
    today: args.today,
    productionDate: args.productionDate,
    expiryDate: args.expiryDate,
    temperatureIndicator: args.temperatureIndicator,
    certificateAttached: args.certificateAttached,
    slurry: slurry ? slurryAcceptance(slurry) : null,
  };
  return decideLot({ fit: args.fit, lot, stationsWithHead: stations.map((s) => s.name) });
}
