import type { DataSource, EntityManager } from 'typeorm';
import type { DrumInput, FitSettings, StationInput } from '../../shared/fit/types';
import { resolveSettings } from '../../shared/fit/rules';
import { judgeDrum, type JudgedDrum, type PoolRow } from '../../shared/fit/search';
import { fieldError, ValidationFailed } from '../common/errors';
import { parseDto } from '../common/validate';
import { Slurry, Station, TubeSet } from '../entities';
import { resolveKey, resolveThread } from '../registry/refs';
import { loadSettings } from '../settings/settings.service';
import { preparedQuery } from '../db/prepared';
import type { Kept } from '../db/change-feed';
import { FitCheckDto } from './fit-check.dto';
import { SNAPSHOT_SQL, type SnapshotRow } from './fit-check.sql';

const isoOrNull = (d: Date | string | null): string | null => (d === null ? null : d instanceof Date ? d.toISOString() : d);

interface ResolvedDrum extends JudgedDrum {
  threadSpecIds: string[];
}

/** Which of a station's tube sets goes into the next drum: the first ready one by label. */
export const NEXT_TUBE_SET_STATE = 'ready';
export const NEXT_TUBE_SET_ORDER = { label: 'ASC' } as const;

const stationOf = (row: Station): { station: StationInput; stationRow: Station } => ({ station: { tapping: row.tapping, agitation: row.agitation, flowLpm: row.flowLpm }, stationRow: row });

/** A drum to check: a registered drum type by id, or one described by hand (already resolved to thread ids). */
interface AdHocDrum {
  input: DrumInput;
  threadSpecIds: string[];
}
type DrumRef = { id: string } | AdHocDrum;

/** A slurry as the rules read it: a registered one, or a plan's name and properties. */
type SlurryFlags = { id?: string; name: string; foams: boolean; shearSensitive: boolean };

/** A fit-check question that has passed validation (the API's body, or one the dock or sourcing builds). */
export type FitQuestion = Pick<FitCheckDto, 'drumTypeId' | 'drum' | 'slurryId' | 'stationId' | 'tubeSetId' | 'tapping' | 'agitation' | 'flowLpm'>;

export type FitAnswer = ReturnType<typeof judgeDrum>;

/**
 * "Which tube and dispense head pairs fit this drum, and why": the server's authoritative answer. One instance,
 * built by the app factory, serves the fit-check route, the dock and sourcing, so all three use the answers
 * kept since the registry last changed.
 */
export class FitCheckService {
  constructor(
    private readonly ds: DataSource,
    private readonly answers: Kept<Buffer> | null = null,
  ) {}

  /** A request body as a question: validated once, here, with the rules that tie its fields together. */
  async parse(body: unknown): Promise<FitQuestion> {
    return this.crossCheck(await parseDto(FitCheckDto, body));
  }

  /** The fields that go together (already-validated questions from inside the server come through here too). */
  crossCheck(q: FitQuestion): FitQuestion {
    if (!q.drumTypeId === !q.drum) {
      throw new ValidationFailed([{ field: q.drumTypeId ? 'drum' : 'drumTypeId', messages: ['give either drumTypeId or drum, not both and not neither'] }]);
    }
    if (q.stationId && (q.tapping || q.agitation || q.flowLpm !== undefined)) {
      throw fieldError('stationId', 'give either stationId or tapping/agitation/flowLpm, not both');
    }
    return q;
  }

  /**
   * The answer as UTF-8 JSON, from the kept answers when the question names a registered drum type (with a
   * slurry, a registered or described station, a tube set). Stations and tube sets notify changes like the
   * registry's tables (migration 1764846000000), so an answer naming them is kept too; a described drum is computed.
   */
  async answer(q: FitQuestion): Promise<{ json: Buffer; cache: 'hit' | 'miss' | 'bypass'; stored: boolean }> {
    return this.kept(this.keyOf(q), () => this.compute(q));
  }

  /** The answer as an object, for the dock: the same kept answers the route serves. */
  async result(q: FitQuestion): Promise<FitAnswer> {
    const key = this.keyOf(this.crossCheck(q));
    if (!key || !this.answers) return this.compute(q);
    return JSON.parse((await this.kept(key, () => this.compute(q))).json.toString('utf8')) as FitAnswer;
  }

  private keyOf(q: FitQuestion): string | null {
    if (!q.drumTypeId) return null;
    const id = (v: string | undefined) => v?.toLowerCase() ?? null;
    return JSON.stringify([id(q.drumTypeId), id(q.slurryId), q.tapping ?? null, q.agitation ?? null, q.flowLpm ?? null, id(q.stationId), id(q.tubeSetId)]);
  }

  /**
   * A registered drum type at a registered station with a slurry by its properties (sourcing plans, hold notices).
   * `at` hands over the station's row and its next tube set when the caller has read them for many stations.
   */
  async checkFor(m: EntityManager, args: { drumTypeId: string; stationId?: string | null; slurry?: SlurryFlags | null; at?: { station: Station; nextTubeSet: TubeSet | null } }): Promise<FitAnswer> {
    const compute = async () => {
      const { station, stationRow } = args.at ? stationOf(args.at.station) : await this.station(m, { stationId: args.stationId ?? undefined });
      const tubeSet = args.at ? args.at.nextTubeSet : await this.nextTubeSet(m, {}, stationRow);
      return this.run(m, { drum: { id: args.drumTypeId }, station, stationRow, slurry: args.slurry ?? null, tubeSet, fieldForDrum: 'drumTypeId' });
    };
    const s = args.slurry;
    // Stations and tube sets notify changes like the registry's tables, so an answer at a station is kept too. The
    // station's next tube set is read from those same tables (by the caller with `at`, or in `compute`).
    const stationId = (args.at?.station.id ?? args.stationId ?? null)?.toLowerCase() ?? null;
    const key = JSON.stringify(['flags', args.drumTypeId.toLowerCase(), s ? [s.name, s.foams, s.shearSensitive] : null, stationId]);
    if (!this.answers) return compute();
    return JSON.parse((await this.kept(key, compute)).json.toString('utf8')) as FitAnswer;
  }

  /** `compute`'s answer, kept under `key` until the registry changes; a null key is always computed. */
  private async kept(key: string | null, compute: () => Promise<FitAnswer>): Promise<{ json: Buffer; cache: 'hit' | 'miss' | 'bypass'; stored: boolean }> {
    const encode = (answer: unknown) => Buffer.from(JSON.stringify(answer));
    if (!key || !this.answers) return { json: encode(await compute()), cache: 'bypass', stored: false };
    const kept = this.answers.get(key);
    if (kept !== undefined) return { json: kept, cache: 'hit', stored: true };
    const ticket = this.answers.ticket();
    const json = encode(await compute());
    if (ticket === null) return { json, cache: 'bypass', stored: false };
    return { json, cache: 'miss', stored: this.answers.set(key, ticket, json) };
  }

  private async compute(q: FitQuestion) {
    const m = this.ds.manager;
    const drum: DrumRef = q.drumTypeId ? { id: q.drumTypeId } : await this.adHocDrum(m, q);
    const slurry = q.slurryId ? await m.findOneBy(Slurry, { id: q.slurryId }) : null;
    if (q.slurryId && !slurry) throw fieldError('slurryId', 'does not name an existing slurry');
    const { station, stationRow } = await this.station(m, q);
    const tubeSet = await this.nextTubeSet(m, q, stationRow);
    return this.run(m, {
      drum,
      station,
      stationRow,
      slurry: slurry ? { id: slurry.id, name: slurry.name, foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null,
      tubeSet,
      fieldForDrum: q.drum ? 'drum.insideDepthMm' : 'drumTypeId',
    });
  }

  private async run(
    m: EntityManager,
    ctx: {
      drum: DrumRef;
      station: StationInput | null;
      stationRow: Station | null;
      slurry: SlurryFlags | null;
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

  private async adHocDrum(m: EntityManager, dto: FitQuestion): Promise<AdHocDrum> {
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

  private async station(m: EntityManager, dto: FitQuestion): Promise<{ station: StationInput | null; stationRow: Station | null }> {
    if (dto.stationId) {
      const row = await m.findOneBy(Station, { id: dto.stationId });
      if (!row) throw fieldError('stationId', 'does not name an existing station');
      return stationOf(row);
    }
    if (dto.tapping || dto.agitation || dto.flowLpm !== undefined) {
      if (!dto.tapping) throw fieldError('tapping', 'is required with agitation or flowLpm');
      return { station: { tapping: dto.tapping, agitation: dto.agitation ?? 'pump', ...(dto.flowLpm !== undefined ? { flowLpm: dto.flowLpm } : {}) }, stationRow: null };
    }
    return { station: null, stationRow: null };
  }

  /**
   * The tube set that would go into this drum: the one named, or the station's clean and ready set (the first by
   * label; `NEXT_TUBE_SET_ORDER`). The sets online and in standby are already in drums; one still being cleaned is not a candidate yet.
   */
  private async nextTubeSet(m: EntityManager, dto: FitQuestion, station: Station | null): Promise<TubeSet | null> {
    if (dto.tubeSetId) {
      const set = await m.findOneBy(TubeSet, { id: dto.tubeSetId });
      if (!set) throw fieldError('tubeSetId', 'does not name an existing tube set');
      return set;
    }
    if (!station) return null;
    return m.findOne(TubeSet, { where: { stationId: station.id, state: NEXT_TUBE_SET_STATE }, order: NEXT_TUBE_SET_ORDER });
  }

  /**
   * Everything one check reads, in one prepared statement (a round trip to the database costs more here than
   * judging the candidates): the site settings, the drum and its openings, and the pairings worth judging.
   * Those are the pairings of tubes that thread into one of the drum's openings and reach the clearance
   * window, then the nearest tubes either side of it (so a near miss can say why), plus those using the
   * station's installed head. Tubes come from an index range scan per thread; a large registry is never
   * sorted whole.
   */
  private async snapshot(m: EntityManager, ref: DrumRef, installedConnectorId: string | null, fieldForDrum: string): Promise<{ drum: ResolvedDrum; settings: FitSettings; pool: PoolRow[] }> {
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
            input: {
              insideDepthMm: row.drum.inside_depth_mm,
              head: row.drum.head,
              openings: row.openings.map((o) => ({ label: o.label, threadCode: o.thread_code, keyCode: o.key_code, boreMm: o.bore_mm })),
            },
            threadSpecIds: row.openings.map((o) => o.thread_spec_id),
          }
        : { id: null, name: null, partNumber: null, input: adHoc!.input, threadSpecIds: adHoc!.threadSpecIds };
    if (drum.input.insideDepthMm <= settings.tipClearanceMaxMm) {
      throw fieldError(fieldForDrum, `inside depth must be more than the site's largest tip clearance (${settings.tipClearanceMaxMm} mm)`);
    }
    return { drum, settings, pool: row.candidates };
  }
}
