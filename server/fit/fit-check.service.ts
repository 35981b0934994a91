import type { DataSource, EntityManager } from 'typeorm';
import type { DrumInput, FitSettings, StationInput } from '../../shared/fit/types';
import { resolveSettings } from '../../shared/fit/rules';
import { judgeDrum, POOL_LIMIT, TUBES_IN_WINDOW, TUBES_NEAR_MISS, type JudgedDrum, type PoolRow } from '../../shared/fit/search';
import { fieldError, ValidationFailed } from '../common/errors';
import { parseDto } from '../common/validate';
import { Slurry, Station, TubeSet } from '../entities';
import { resolveKey, resolveThread } from '../registry/refs';
import { loadSettings } from '../settings/settings.service';
import { preparedQuery } from '../db/prepared';
import type { Kept } from '../db/change-feed';
import { FitCheckDto } from './fit-check.dto';

const isoOrNull = (d: Date | string | null): string | null => (d === null ? null : d instanceof Date ? d.toISOString() : d);

/** A candidate row as the SQL reads it (the columns `judgeDrum` takes). */
type CandidateRow = PoolRow;

interface ResolvedDrum extends JudgedDrum {
  threadSpecIds: string[];
}

export const CANDIDATE_SQL = `
  SELECT p.id AS pairing_id, p.status, t.id AS dip_tube_id, t.part_number AS tube_part, th.code AS thread_code, t.length_mm,
         tk.code AS tube_key, t.channels, t.od_mm AS tube_od_mm, c.id AS connector_id, c.part_number AS head_part, ck.code AS head_key,
         c.feed_bore_mm, c.feed_nominal, c.return_bore_mm, c.return_nominal, c.return_path, c.suited_to
  FROM pairings p
  JOIN dip_tubes t ON t.id = p.dip_tube_id
  JOIN thread_specs th ON th.id = t.thread_spec_id
  LEFT JOIN key_codes tk ON tk.id = t.key_code_id
  JOIN connectors c ON c.id = p.connector_id
  LEFT JOIN key_codes ck ON ck.id = c.key_code_id
  WHERE p.status <> 'retired'`;

/** Approved pairings first, then by part numbers: which candidates make the pool when there are more. */
const POOL_ORDER = `CASE p.status WHEN 'approved' THEN 0 ELSE 1 END, t.part_number, c.part_number`;
const CANDIDATE_ORDER = `CASE status WHEN 'approved' THEN 0 ELSE 1 END, tube_part, head_part`;

/**
 * $1 the drum type, or null for a hand-described drum with depth $2 and thread ids $3; $4 the station's
 * installed head or null. The limits are written into the text (not parameters) so the generic plan is
 * costed for the real sizes: a few dozen index lookups, never a scan of the pairings.
 */
export const SNAPSHOT_SQL = `
  WITH st AS (SELECT * FROM site_settings ORDER BY created_at LIMIT 1),
  d AS (SELECT name, part_number, inside_depth_mm FROM drum_types WHERE id = $1::uuid),
  o AS (
    SELECT o.label, o.thread_spec_id, th.code AS thread_code, k.code AS key_code, o.bore_mm
    FROM drum_openings o JOIN thread_specs th ON th.id = o.thread_spec_id LEFT JOIN key_codes k ON k.id = o.key_code_id
    WHERE o.drum_type_id = $1::uuid),
  reach AS (
    SELECT depth - st.tip_clearance_max_mm AS lo, depth - st.tip_clearance_min_mm AS hi
    FROM st, (SELECT coalesce((SELECT inside_depth_mm FROM d), $2::float8) AS depth) depth),
  threads AS (SELECT thread_spec_id AS id FROM o UNION SELECT unnest($3::uuid[])),
  tubes AS (
    SELECT x.id FROM threads, reach, LATERAL (
      (SELECT id FROM dip_tubes WHERE thread_spec_id = threads.id AND length_mm BETWEEN reach.lo AND reach.hi ORDER BY length_mm LIMIT ${TUBES_IN_WINDOW})
      UNION ALL (SELECT id FROM (SELECT id FROM dip_tubes WHERE thread_spec_id = threads.id AND length_mm < reach.lo ORDER BY length_mm DESC LIMIT ${TUBES_NEAR_MISS}) below)
      UNION ALL (SELECT id FROM (SELECT id FROM dip_tubes WHERE thread_spec_id = threads.id AND length_mm > reach.hi ORDER BY length_mm ASC LIMIT ${TUBES_NEAR_MISS}) above)) x),
  pairs AS (
    SELECT p.* FROM tubes, LATERAL (SELECT id, status, dip_tube_id, connector_id FROM pairings WHERE dip_tube_id = tubes.id AND status <> 'retired' OFFSET 0) p),
  by_tube AS (
    SELECT p.id FROM pairs p JOIN dip_tubes t ON t.id = p.dip_tube_id JOIN connectors c ON c.id = p.connector_id
    ORDER BY ${POOL_ORDER} LIMIT ${POOL_LIMIT}),
  by_head AS (
    SELECT p.id FROM pairings p JOIN dip_tubes t ON t.id = p.dip_tube_id JOIN connectors c ON c.id = p.connector_id
    WHERE p.connector_id = $4::uuid AND p.status <> 'retired' AND p.id NOT IN (SELECT id FROM by_tube)
    ORDER BY ${POOL_ORDER} LIMIT ${POOL_LIMIT}),
  pool AS (
    SELECT CASE WHEN x.pairing_id IN (SELECT id FROM by_tube) THEN 0 ELSE 1 END AS part, x.*
    FROM (${CANDIDATE_SQL} AND p.id IN (SELECT id FROM by_tube UNION ALL SELECT id FROM by_head)) x)
  SELECT (SELECT to_jsonb(st) FROM st) AS settings,
         (SELECT to_jsonb(d) FROM d) AS drum,
         (SELECT coalesce(jsonb_agg(o ORDER BY o.label), '[]') FROM o) AS openings,
         (SELECT coalesce(jsonb_agg(to_jsonb(pool) - 'part' ORDER BY part, ${CANDIDATE_ORDER}), '[]') FROM pool) AS candidates`;

interface SnapshotRow {
  settings: { tip_clearance_min_mm: number; tip_clearance_max_mm: number; thread_match_tolerance_mm: number; laminar_limit: number; max_return_velocity_ratio: number } | null;
  drum: { name: string; part_number: string; inside_depth_mm: number } | null;
  openings: Array<{ label: string; thread_spec_id: string; thread_code: string; key_code: string | null; bore_mm: number }>;
  candidates: CandidateRow[];
}

/** A drum to check: a registered drum type by id, or one described by hand (already resolved to thread ids). */
interface AdHocDrum {
  input: DrumInput;
  threadSpecIds: string[];
}
type DrumRef = { id: string } | AdHocDrum;

/** "Which tube and connector pairs fit this drum, and why": the server's authoritative answer. */
export class FitCheckService {
  constructor(
    private readonly ds: DataSource,
    private readonly answers: Kept<Buffer> | null = null,
  ) {}

  /** The check for one request body. */
  async check(body: unknown) {
    return this.compute(await this.parse(body));
  }

  /**
   * The answer as UTF-8 JSON, from the kept answers when the question is about the registry alone (a
   * drum type, with a slurry or a described station at most). With a registered station or tube set the
   * rinse rules depend on the clock and on rotation, so those are always computed.
   */
  async answer(body: unknown): Promise<{ json: Buffer; cache: 'hit' | 'miss' | 'bypass'; stored: boolean }> {
    const dto = await this.parse(body);
    const key =
      this.answers && dto.drumTypeId && !dto.stationId && !dto.tubeSetId
        ? JSON.stringify([dto.drumTypeId.toLowerCase(), dto.slurryId?.toLowerCase() ?? null, dto.tapping ?? null, dto.agitation ?? null, dto.flowLpm ?? null])
        : null;
    const encode = (answer: unknown) => Buffer.from(JSON.stringify(answer));
    if (!key || !this.answers) return { json: encode(await this.compute(dto)), cache: 'bypass', stored: false };
    const kept = this.answers.get(key);
    if (kept !== undefined) return { json: kept, cache: 'hit', stored: true };
    const ticket = this.answers.ticket();
    const json = encode(await this.compute(dto));
    if (ticket === null) return { json, cache: 'bypass', stored: false };
    return { json, cache: 'miss', stored: this.answers.set(key, ticket, json) };
  }

  private async parse(body: unknown): Promise<FitCheckDto> {
    const dto = await parseDto(FitCheckDto, body);
    if (!dto.drumTypeId === !dto.drum) {
      throw new ValidationFailed([{ field: dto.drumTypeId ? 'drum' : 'drumTypeId', messages: ['give either drumTypeId or drum, not both and not neither'] }]);
    }
    if (dto.stationId && (dto.tapping || dto.agitation || dto.flowLpm !== undefined)) {
      throw fieldError('stationId', 'give either stationId or tapping/agitation/flowLpm, not both');
    }
    return dto;
  }

  private async compute(dto: FitCheckDto) {
    const m = this.ds.manager;
    const drum: DrumRef = dto.drumTypeId ? { id: dto.drumTypeId } : await this.adHocDrum(m, dto);
    const slurry = dto.slurryId ? await m.findOneBy(Slurry, { id: dto.slurryId }) : null;
    if (dto.slurryId && !slurry) throw fieldError('slurryId', 'does not name an existing slurry');
    const { station, stationRow } = await this.station(m, dto);
    const tubeSet = await this.nextTubeSet(m, dto, stationRow);
    return this.run(m, {
      drum,
      station,
      stationRow,
      slurry: slurry ? { id: slurry.id, name: slurry.name, foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null,
      tubeSet,
      fieldForDrum: dto.drum ? 'drum.insideDepthMm' : 'drumTypeId',
    });
  }

  /** The same check for callers inside the server (dock records, sourcing plans), by ids and slurry properties. */
  async checkFor(m: EntityManager, args: { drumTypeId: string; stationId?: string | null; slurry?: { id?: string; name: string; foams: boolean; shearSensitive: boolean } | null }) {
    const { station, stationRow } = await this.station(m, { stationId: args.stationId ?? undefined } as FitCheckDto);
    const tubeSet = await this.nextTubeSet(m, {} as FitCheckDto, stationRow);
    return this.run(m, { drum: { id: args.drumTypeId }, station, stationRow, slurry: args.slurry ?? null, tubeSet, fieldForDrum: 'drumTypeId' });
  }

  private async run(
    m: EntityManager,
    ctx: {
      drum: DrumRef;
      station: StationInput | null;
      stationRow: Station | null;
      slurry: { id?: string; name: string; foams: boolean; shearSensitive: boolean } | null;
      tubeSet: TubeSet | null;
      fieldForDrum: string;
    },
  ) {
    const { drum, settings, pool } = await this.snapshot(m, ctx.drum, ctx.stationRow?.connectorId ?? null, ctx.fieldForDrum);
    const t = ctx.tubeSet;
    return judgeDrum({
      drum,
      pool,
      station: ctx.station,
      stationRow: ctx.stationRow,
      slurry: ctx.slurry,
      tubeSet: t ? { id: t.id, label: t.label, dipTubeId: t.dipTubeId, lastRinsedAt: isoOrNull(t.lastRinsedAt), lastUsedAt: isoOrNull(t.lastUsedAt) } : null,
      settings,
    });
  }

  /** The drum and its openings in one statement (this runs on every dock check). */
  async loadDrum(m: EntityManager, id: string): Promise<ResolvedDrum> {
    const rows: Array<{
      name: string;
      part_number: string;
      inside_depth_mm: number;
      label: string | null;
      thread_spec_id: string | null;
      thread_code: string | null;
      key_code: string | null;
      bore_mm: number | null;
    }> = await m.query(
      `SELECT d.name, d.part_number, d.inside_depth_mm, o.label, o.thread_spec_id, th.code AS thread_code, k.code AS key_code, o.bore_mm
       FROM drum_types d
       LEFT JOIN drum_openings o ON o.drum_type_id = d.id
       LEFT JOIN thread_specs th ON th.id = o.thread_spec_id
       LEFT JOIN key_codes k ON k.id = o.key_code_id
       WHERE d.id = $1
       ORDER BY o.label`,
      [id],
    );
    if (!rows.length) throw fieldError('drumTypeId', 'does not name an existing drum type');
    const openings = rows.filter((r) => r.label !== null);
    return {
      id,
      name: rows[0].name,
      partNumber: rows[0].part_number,
      input: {
        insideDepthMm: rows[0].inside_depth_mm,
        openings: openings.map((o) => ({ label: o.label!, threadCode: o.thread_code, keyCode: o.key_code, boreMm: o.bore_mm })),
      },
      threadSpecIds: openings.map((o) => o.thread_spec_id!),
    };
  }

  private async adHocDrum(m: EntityManager, dto: FitCheckDto): Promise<AdHocDrum> {
    const drum = dto.drum!;
    const openings = [];
    const ids: string[] = [];
    for (const [i, o] of drum.openings.entries()) {
      const spec = await resolveThread(m, o.threadCode, `drum.openings.${i}.threadCode`);
      await resolveKey(m, o.keyCode, `drum.openings.${i}.keyCode`);
      ids.push(spec.id);
      openings.push({ label: o.label ?? `opening ${i + 1}`, threadCode: spec.code, keyCode: o.keyCode ?? null, boreMm: o.boreMm ?? null });
    }
    return { input: { insideDepthMm: drum.insideDepthMm, openings }, threadSpecIds: ids };
  }

  private async station(m: EntityManager, dto: FitCheckDto): Promise<{ station: StationInput | null; stationRow: Station | null }> {
    if (dto.stationId) {
      const row = await m.findOneBy(Station, { id: dto.stationId });
      if (!row) throw fieldError('stationId', 'does not name an existing station');
      return { station: { tapping: row.tapping, agitation: row.agitation, flowLpm: row.flowLpm }, stationRow: row };
    }
    if (dto.tapping || dto.agitation || dto.flowLpm !== undefined) {
      if (!dto.tapping) throw fieldError('tapping', 'is required with agitation or flowLpm');
      return { station: { tapping: dto.tapping, agitation: dto.agitation ?? 'pump', ...(dto.flowLpm !== undefined ? { flowLpm: dto.flowLpm } : {}) }, stationRow: null };
    }
    return { station: null, stationRow: null };
  }

  /**
   * The tube set that would go into this drum: the one named, or the station's clean and ready set. The sets
   * online and in standby are already in drums; one still being cleaned is not a candidate yet.
   */
  private async nextTubeSet(m: EntityManager, dto: FitCheckDto, station: Station | null): Promise<TubeSet | null> {
    if (dto.tubeSetId) {
      const set = await m.findOneBy(TubeSet, { id: dto.tubeSetId });
      if (!set) throw fieldError('tubeSetId', 'does not name an existing tube set');
      return set;
    }
    if (!station) return null;
    return m.findOne(TubeSet, { where: { stationId: station.id, state: 'ready' }, order: { label: 'ASC' } });
  }

  /**
   * Everything one check reads, in one prepared statement (a round trip to the database costs more here than
   * judging the candidates): the site settings, the drum and its openings, and the pairings worth judging.
   * Those are the pairings of tubes that thread into one of the drum's openings and reach the clearance
   * window, then the nearest tubes either side of it (so a near miss can say why), plus those using the
   * station's installed head. Tubes come from an index range scan per thread; a large registry is never
   * sorted whole.
   */
  private async snapshot(m: EntityManager, ref: DrumRef, installedConnectorId: string | null, fieldForDrum: string): Promise<{ drum: ResolvedDrum; settings: FitSettings; pool: CandidateRow[] }> {
    const drumTypeId = 'id' in ref ? ref.id : null;
    const adHoc = 'input' in ref ? ref : null;
    const [row] = await preparedQuery<SnapshotRow>(this.ds, 'fit-snapshot', SNAPSHOT_SQL, [drumTypeId, adHoc?.input.insideDepthMm ?? null, adHoc?.threadSpecIds ?? [], installedConnectorId], m);
    if (!row.settings) {
      await loadSettings(m); // a new site: create its settings row with the defaults, then read again
      return this.snapshot(m, ref, installedConnectorId, fieldForDrum);
    }
    const settings = resolveSettings({
      tipClearanceMinMm: row.settings.tip_clearance_min_mm,
      tipClearanceMaxMm: row.settings.tip_clearance_max_mm,
      threadMatchToleranceMm: row.settings.thread_match_tolerance_mm,
      laminarLimit: row.settings.laminar_limit,
      maxReturnVelocityRatio: row.settings.max_return_velocity_ratio,
    });
    if (drumTypeId && !row.drum) throw fieldError('drumTypeId', 'does not name an existing drum type');
    const drum: ResolvedDrum =
      drumTypeId && row.drum
        ? {
            id: drumTypeId,
            name: row.drum.name,
            partNumber: row.drum.part_number,
            input: { insideDepthMm: row.drum.inside_depth_mm, openings: row.openings.map((o) => ({ label: o.label, threadCode: o.thread_code, keyCode: o.key_code, boreMm: o.bore_mm })) },
            threadSpecIds: row.openings.map((o) => o.thread_spec_id),
          }
        : { id: null, name: null, partNumber: null, input: adHoc!.input, threadSpecIds: adHoc!.threadSpecIds };
    if (drum.input.insideDepthMm <= settings.tipClearanceMaxMm) {
      throw fieldError(fieldForDrum, `inside depth must be more than the site's largest tip clearance (${settings.tipClearanceMaxMm} mm)`);
    }
    return { drum, settings, pool: row.candidates };
  }
}
