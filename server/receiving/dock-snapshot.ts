import { createHash } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { DockSnapshot } from '../../shared/dock/snapshot';
import type { PoolRow } from '../../shared/fit/search';
import { DrumType, Slurry, Station, Supplier, ThreadSpec, TubeSet } from '../entities';
import { CANDIDATE_SQL } from '../fit/fit-check.sql';
import { fitSettingsOf, loadSettings } from '../settings/settings.service';
import { slurryAcceptance } from './lot-decision';

const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
const iso = (d: Date | null) => (d ? d.toISOString() : null);

/**
 * The registry as a phone needs it to judge a lot with no network: every drum type with its openings, every
 * tube's thread and length, every pairing that is not retired, the stations with their installed head and
 * ready tube set, the slurries with their acceptance terms, the suppliers and the site's settings. Read in one
 * repeatable-read transaction, so it is one consistent state; its revision is a digest of the content, so
 * an unchanged registry gives the same revision (and a 304 to a phone that has it).
 */
export async function buildDockSnapshot(ds: DataSource, now: Date): Promise<DockSnapshot> {
  return ds.transaction('REPEATABLE READ', async (m) => {
    const settings = await loadSettings(m);
    const [drums, stations, readySets, slurries, suppliers, threads, tubes, pairings] = [
      await m.find(DrumType, { relations: { supplier: true, openings: { threadSpec: true, keyCode: true } } }),
      await m.find(Station, { relations: { connector: true } }),
      await m.find(TubeSet, { where: { state: 'ready' } }),
      await m.find(Slurry, { relations: { supplier: true, drumType: true } }),
      await m.find(Supplier),
      await m.find(ThreadSpec),
      (await m.query(`SELECT t.id, th.code AS "threadCode", t.length_mm AS "lengthMm" FROM dip_tubes t JOIN thread_specs th ON th.id = t.thread_spec_id ORDER BY t.id`)) as DockSnapshot['tubes'],
      (await m.query(`${CANDIDATE_SQL} ORDER BY p.id`)) as PoolRow[],
    ];
    const body: Omit<DockSnapshot, 'revision' | 'asOf'> = {
      settings: { ...fitSettingsOf(settings), timeZone: settings.timeZone },
      threadCodes: threads.map((t) => t.code).sort(byText),
      drumTypes: drums
        .map((d) => ({
          id: d.id,
          name: d.name,
          partNumber: d.partNumber,
          supplierName: d.supplier?.name ?? null,
          insideDepthMm: d.insideDepthMm,
          head: d.head,
          openings: (d.openings ?? [])
            .map((o) => ({ label: o.label, threadCode: o.threadSpec!.code, keyCode: o.keyCode?.code ?? null, boreMm: o.boreMm ?? null }))
            .sort((a, b) => byText(a.label, b.label)),
        }))
        .sort((a, b) => byText(a.id, b.id)),
      tubes,
      pairings,
      stations: stations
        .map((s) => {
          const ready = readySets.filter((t) => t.stationId === s.id).sort((a, b) => byText(a.label, b.label))[0];
          return {
            id: s.id,
            name: s.name,
            bay: s.bay,
            tapping: s.tapping,
            agitation: s.agitation,
            flowLpm: s.flowLpm,
            connectorId: s.connectorId,
            connectorPartNumber: s.connector?.partNumber ?? null,
            readyTubeSet: ready ? { id: ready.id, label: ready.label, dipTubeId: ready.dipTubeId, lastRinsedAt: iso(ready.lastRinsedAt), lastUsedAt: iso(ready.lastUsedAt) } : null,
          };
        })
        .sort((a, b) => byText(a.id, b.id)),
      slurries: slurries
        .map((s) => ({
          id: s.id,
          name: s.name,
          supplierId: s.supplierId,
          supplierName: s.supplier?.name ?? null,
          region: s.region,
          drumTypeId: s.drumTypeId,
          drumTypeName: s.drumType?.name ?? null,
          foams: s.foams,
          shearSensitive: s.shearSensitive,
          acceptance: slurryAcceptance(s),
        }))
        .sort((a, b) => byText(a.id, b.id)),
      suppliers: suppliers.map((s) => ({ id: s.id, name: s.name, region: s.region })).sort((a, b) => byText(a.id, b.id)),
    };
    const revision = createHash('sha256').update(JSON.stringify(body)).digest('base64url').slice(0, 16);
    return { revision, asOf: now.toISOString(), ...body };
  });
}
