import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { AttachmentsService } from '../attachments/attachments.service';
import { audit } from '../audit/audit';
import { HttpError } from '../common/errors';
import { DrumOpening, DrumType, fitFileName, ImportRecord, type ImportKind } from '../entities';
import { normaliseHeader } from './columns';
import { decodeCsv, detectDelimiter } from './decode';
import { loadReferences, parseRows, pickKeys, type RowError } from './read-rows';
import type { ImportHistoryItem, ImportRun } from '../../shared/contract/imports';
import { copyOf, nameOf, type Sent } from '../common/json';

export type { RowError } from './read-rows';

export interface ImportOptions {
  /** Rows per multi-row statement. */
  chunkSize?: number;
  /** Tests only: throw after this many rows are written, to prove the commit is all or nothing. */
  failAfterRows?: number;
}

type Action = 'new' | 'changed' | 'unchanged';
interface PlannedRow {
  line: number;
  key: string;
  action: Action;
  supplierId: string;
  partNumber: string;
  values: Record<string, unknown>;
  openings?: Array<Record<string, unknown>>;
}

const MAX_ERRORS = 500;

/** Supplier spec sheets: parsed as a stream, planned row by row, written in one transaction or not at all. */
export class ImportService {
  constructor(
    private readonly ds: DataSource,
    private readonly attachments: AttachmentsService,
    private readonly options: ImportOptions = {},
  ) {}

  async run(args: { kind: ImportKind; dryRun: boolean; fileName: string; bytes: Buffer; userId: string }) {
    // BUNGWISE_IMPORT_TIMING=1 logs where an import spends its time (the benchmark reads it).
    const started = performance.now();
    const phases: Record<string, number> = {};
    const mark = (name: string) => (phases[name] = Math.round(performance.now() - started));
    const { text, encoding } = decodeCsv(args.bytes);
    const delimiter = detectDelimiter(text);
    mark('decoded');
    const m = this.ds.manager;
    const refs = await loadReferences(m);
    const parsed = await parseRows(args.kind, text, delimiter, refs);
    mark('parsed and validated');
    const { errors, ignoredColumns, header } = parsed;
    const rows = args.kind === 'drum-types' ? parsed.rows : this.dropRepeats(parsed.rows, errors, header);
    const planned = await this.plan(m, args.kind, rows);
    mark('planned');
    const counts = {
      new: planned.filter((r) => r.action === 'new').length,
      changed: planned.filter((r) => r.action === 'changed').length,
      unchanged: planned.filter((r) => r.action === 'unchanged').length,
      rejected: new Set(errors.map((e) => e.line)).size,
    };
    const id = randomUUID();
    const outcome: ImportRecord['outcome'] = args.dryRun ? 'dry-run' : counts.rejected ? 'refused' : 'committed';
    const record = (tx: EntityManager, attachmentId: string | null) =>
      tx.save(
        tx.create(ImportRecord, {
          id,
          kind: args.kind,
          fileName: fitFileName(args.fileName),
          dryRun: args.dryRun,
          outcome,
          encoding,
          delimiter,
          counts,
          errors: errors.slice(0, MAX_ERRORS),
          attachmentId,
          byId: args.userId,
        }),
      );
    // The rows, the import's record, its audit line and the kept file's row: one transaction, all or nothing.
    const writeAll = async (tx: EntityManager, attachmentId: string | null) => {
      if (outcome === 'committed')
        await this.write(
          tx,
          args.kind,
          planned.filter((r) => r.action !== 'unchanged'),
        );
      await record(tx, attachmentId);
      if (outcome === 'committed') {
        await audit(tx, {
          userId: args.userId,
          action: 'import',
          entity: args.kind,
          entityId: id,
          summary: `Imported ${args.fileName}: ${counts.new} new, ${counts.changed} changed, ${counts.unchanged} unchanged`,
          after: { counts },
        });
      }
      return attachmentId;
    };
    // The file itself is kept with the import's record (its bytes are put in the store just before).
    const file = { ownerKind: 'import' as const, ownerId: id, fileName: args.fileName, contentType: 'text/csv', bytes: args.bytes, userId: args.userId };
    const attachmentId = this.attachments.enabled ? await this.attachments.keepWith(file, (tx, a) => writeAll(tx, a.id)) : await this.ds.transaction((tx) => writeAll(tx, null));
    mark('written');
    const body = {
      id,
      kind: args.kind,
      fileName: args.fileName,
      dryRun: args.dryRun,
      outcome,
      encoding,
      delimiter,
      header,
      ignoredColumns,
      counts,
      errors: errors.slice(0, MAX_ERRORS),
      rows: planned.slice(0, 200).map((r) => ({ line: r.line, action: r.action, partNumber: r.partNumber, supplierId: r.supplierId })),
      attachmentId,
    } satisfies ImportRun;
    if (process.env.BUNGWISE_IMPORT_TIMING === '1') console.error(`[bungwise] import of ${rows.length} rows, ms since start: ${JSON.stringify(phases)}`);
    if (outcome === 'refused') {
      throw new HttpError(422, 'import_refused', `Nothing was written: ${counts.rejected} row(s) have problems. Fix them (see details) and import again.`, body);
    }
    return body;
  }

  /** A part number twice in one file is ambiguous: both rows are reported, neither is imported. */
  private dropRepeats(rows: Array<{ line: number; values: Record<string, unknown> }>, errors: RowError[], header: string[]) {
    const lines = new Map<string, number[]>();
    for (const r of rows) {
      const key = `${r.values.supplierId}|${r.values.partNumber}`;
      lines.set(key, [...(lines.get(key) ?? []), r.line]);
    }
    const partColumn = header.find((h) => ['partnumber', 'partno', 'part'].includes(normaliseHeader(h))) ?? 'part_number';
    const repeated = new Set<number>();
    for (const ls of lines.values()) {
      if (ls.length < 2) continue;
      for (const l of ls) {
        repeated.add(l);
        errors.push({ line: l, column: partColumn, reason: `the same supplier and part number are on lines ${ls.join(', ')}` });
      }
    }
    errors.sort((a, b) => a.line - b.line);
    return rows.filter((r) => !repeated.has(r.line));
  }

  /** New, changed or unchanged against what is stored, keyed by supplier + part number. */
  private async plan(m: EntityManager, kind: ImportKind, rows: Array<{ line: number; values: Record<string, unknown> }>): Promise<PlannedRow[]> {
    const supplierIds = [...new Set(rows.map((r) => r.values.supplierId as string))];
    if (kind === 'drum-types') return this.planDrums(m, rows, supplierIds);
    const table = kind === 'dip-tubes' ? 'dip_tubes' : 'connectors';
    const fields = kind === 'dip-tubes' ? DIP_TUBE_FIELDS : CONNECTOR_FIELDS;
    const existing: Array<Record<string, unknown>> = supplierIds.length
      ? await m.query(`SELECT supplier_id, part_number, ${fields.map(([, c]) => c).join(', ')} FROM ${table} WHERE supplier_id = ANY($1::uuid[])`, [supplierIds])
      : [];
    const byKey = new Map(existing.map((e) => [`${e.supplier_id}|${e.part_number}`, e]));
    const seen = new Set<string>();
    const out: PlannedRow[] = [];
    for (const r of rows) {
      const key = `${r.values.supplierId}|${r.values.partNumber}`;
      if (seen.has(key)) continue;
      seen.add(key);
      const prev = byKey.get(key);
      const action: Action = !prev ? 'new' : fields.every(([f, c]) => same(r.values[f], prev[c])) ? 'unchanged' : 'changed';
      out.push({ line: r.line, key, action, supplierId: r.values.supplierId as string, partNumber: String(r.values.partNumber), values: r.values });
    }
    return out;
  }

  private async planDrums(m: EntityManager, rows: Array<{ line: number; values: Record<string, unknown> }>, supplierIds: string[]): Promise<PlannedRow[]> {
    const groups = new Map<string, { line: number; values: Record<string, unknown>; openings: Array<Record<string, unknown>> }>();
    for (const r of rows) {
      const key = `${r.values.supplierId}|${r.values.partNumber}`;
      const g = groups.get(key);
      const opening = { label: r.values.openingLabel, threadSpecId: r.values.openingThreadId, boreMm: r.values.openingBoreMm, keyCodeId: r.values.openingKeyId, position: r.values.openingPosition };
      if (!g) groups.set(key, { line: r.line, values: r.values, openings: [opening] });
      else g.openings.push(opening);
    }
    const existing = supplierIds.length ? await m.find(DrumType, { where: supplierIds.map((supplierId) => ({ supplierId })), relations: { openings: true } }) : [];
    const byKey = new Map(existing.map((d) => [`${d.supplierId}|${d.partNumber}`, d]));
    const out: PlannedRow[] = [];
    for (const [key, g] of groups) {
      const prev = byKey.get(key);
      let action: Action = 'new';
      if (prev) {
        const drumSame = DRUM_FIELDS.every((f) => same(g.values[f], (prev as unknown as Record<string, unknown>)[f]));
        const sig = (o: Record<string, unknown>) => [o.label, o.threadSpecId, o.boreMm, o.keyCodeId ?? null, o.position].join('|');
        const a = g.openings.map(sig).sort().join(';');
        const b = (prev.openings ?? [])
          .map((o) => sig(o as unknown as Record<string, unknown>))
          .sort()
          .join(';');
        action = drumSame && a === b ? 'unchanged' : 'changed';
      }
      out.push({ line: g.line, key, action, supplierId: g.values.supplierId as string, partNumber: String(g.values.partNumber), values: g.values, openings: g.openings });
    }
    return out;
  }

  /** Writes the plan: multi-row upserts (one statement per chunk), inside the caller's transaction. */
  private async write(tx: EntityManager, kind: ImportKind, rows: PlannedRow[]): Promise<void> {
    const chunk = this.options.chunkSize ?? 2000;
    let written = 0;
    for (let i = 0; i < rows.length; i += chunk) {
      const part = rows.slice(i, i + chunk);
      if (kind === 'drum-types') await this.writeDrums(tx, part);
      else await this.upsertFlat(tx, kind, part);
      written += part.length;
      if (this.options.failAfterRows !== undefined && written >= this.options.failAfterRows) {
        throw new Error(`injected failure after ${written} row(s)`);
      }
    }
  }

  private async upsertFlat(tx: EntityManager, kind: 'dip-tubes' | 'connectors', rows: PlannedRow[]): Promise<void> {
    const table = kind === 'dip-tubes' ? 'dip_tubes' : 'connectors';
    const fields = kind === 'dip-tubes' ? DIP_TUBE_FIELDS : CONNECTOR_FIELDS;
    const cols = ['supplier_id', 'part_number', ...fields.map(([, c]) => c)];
    const types = ['uuid', 'text', ...fields.map(([, , t]) => t)];
    const arrays = [rows.map((r) => r.supplierId), rows.map((r) => r.partNumber), ...fields.map(([f]) => rows.map((r) => r.values[f] ?? null))];
    const updates = fields.map(([, c]) => `${c} = EXCLUDED.${c}`).join(', ');
    await tx.query(
      `INSERT INTO ${table} (${cols.join(', ')}, version)
       SELECT ${cols.map((c) => `u.${c}`).join(', ')}, 1 FROM unnest(${types.map((t, i) => `$${i + 1}::${t}[]`).join(', ')}) AS u(${cols.join(', ')})
       ON CONFLICT (supplier_id, part_number) DO UPDATE SET ${updates}, version = ${table}.version + 1, updated_at = now()`,
      arrays,
    );
  }

  private async writeDrums(tx: EntityManager, rows: PlannedRow[]): Promise<void> {
    for (const r of rows) {
      const values = pickKeys(r.values, ['supplierId', 'partNumber', ...DRUM_FIELDS]);
      const found = await tx.findOneBy(DrumType, { supplierId: r.supplierId, partNumber: r.partNumber });
      const next = found ? tx.merge(DrumType, found, values as Partial<DrumType>) : tx.create(DrumType, values as Partial<DrumType>);
      next.updatedAt = new Date();
      const drum = await tx.save(next);
      await tx.delete(DrumOpening, { drumTypeId: drum.id });
      for (const o of r.openings ?? []) await tx.save(tx.create(DrumOpening, { ...(o as Partial<DrumOpening>), drumTypeId: drum.id }));
    }
  }

  async history(limit = 50) {
    const rows = await this.ds.getRepository(ImportRecord).find({ relations: { by: true }, order: { createdAt: 'DESC' }, take: limit });
    return rows.map((r) => importJson(r, 50));
  }
}

/** A recorded import (the history's items, GET /imports/:id), with at most `maxErrors` of its row errors. */
export const importJson = (r: ImportRecord, maxErrors?: number) =>
  ({
    ...copyOf(r, ['id', 'kind', 'fileName', 'dryRun', 'outcome', 'encoding', 'delimiter', 'counts', 'attachmentId']),
    errors: r.errors.slice(0, maxErrors),
    byName: nameOf(r.by),
    at: r.createdAt,
  }) satisfies Sent<ImportHistoryItem>;

// [field, column, SQL type] for the flat kinds, in the order written.
const DIP_TUBE_FIELDS: Array<[string, string, string]> = [
  ['threadSpecId', 'thread_spec_id', 'uuid'],
  ['lengthMm', 'length_mm', 'float8'],
  ['boreMm', 'bore_mm', 'float8'],
  ['odMm', 'od_mm', 'float8'],
  ['material', 'material', 'text'],
  ['keyCodeId', 'key_code_id', 'uuid'],
  ['channels', 'channels', 'text'],
];
const CONNECTOR_FIELDS: Array<[string, string, string]> = [
  ['keyCodeId', 'key_code_id', 'uuid'],
  ['feedBoreMm', 'feed_bore_mm', 'float8'],
  ['feedNominal', 'feed_nominal', 'text'],
  ['returnBoreMm', 'return_bore_mm', 'float8'],
  ['returnNominal', 'return_nominal', 'text'],
  ['returnPath', 'return_path', 'text'],
  ['suitedTo', 'suited_to', 'text'],
  ['wettedMaterials', 'wetted_materials', 'text'],
];
const DRUM_FIELDS = ['region', 'name', 'nominalCapacityL', 'material', 'head', 'unPackagingCode', 'outsideHeightMm', 'insideDepthMm', 'outsideDiameterMm'];

function same(a: unknown, b: unknown): boolean {
  if (a == null || b == null) return a == null && b == null;
  if (typeof a === 'number' || typeof b === 'number') return Math.abs(Number(a) - Number(b)) < 1e-9;
  return String(a) === String(b);
}
