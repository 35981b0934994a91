import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import { plainToInstance } from 'class-transformer';
import { validateSync, type ValidationError } from 'class-validator';
import { parse } from 'csv-parse';
import type { DataSource, EntityManager } from 'typeorm';
import { inToMm } from '../../shared/units';
import { storeAttachment } from '../attachments/attachments.router';
import { HttpError } from '../common/errors';
import { DrumOpening, DrumType, ImportRecord, KeyCode, Supplier, ThreadSpec, type ImportKind } from '../entities';
import { nearestCodes } from '../registry/refs';
import { ConnectorDto, DipTubeDto, DrumTypeDto } from '../registry/registry.dto';
import type { Storage } from '../storage/storage';
import { COLUMNS, normaliseHeader, type ColumnSpec } from './columns';
import { audit } from '../audit/audit';
import { decodeCsv, detectDelimiter } from './decode';

export interface RowError {
  line: number;
  column: string;
  reason: string;
}

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
const DTO = new Map<ImportKind, new () => object>([['dip-tubes', DipTubeDto], ['connectors', ConnectorDto], ['drum-types', DrumTypeDto]]);

function firstProblem(errors: ValidationError[]): { field: string; message: string } | null {
  for (const e of errors) {
    if (e.constraints) return { field: e.property, message: Object.values(e.constraints)[0] };
    const inner = firstProblem(e.children ?? []);
    if (inner) return { field: `${e.property}.${inner.field}`, message: inner.message };
  }
  return null;
}

/** Supplier spec sheets: parsed as a stream, planned row by row, written in one transaction or not at all. */
export class ImportService {
  constructor(
    private readonly ds: DataSource,
    private readonly storage: Storage | null,
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
    const refs = await this.references(m);
    const parsed = await this.parseRows(args.kind, text, delimiter, refs);
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
    // The file itself is kept with the import's record.
    const attachmentId = this.storage
      ? (await storeAttachment(this.ds, this.storage, { ownerKind: 'import', ownerId: id, fileName: args.fileName, contentType: 'text/csv', bytes: args.bytes, userId: args.userId })).id
      : null;
    mark('file kept');

    const record = (mgr: EntityManager) =>
      mgr.save(mgr.create(ImportRecord, { id, kind: args.kind, fileName: args.fileName.slice(0, 255), dryRun: args.dryRun, outcome, encoding, delimiter, counts, errors: errors.slice(0, MAX_ERRORS), attachmentId, byId: args.userId }));

    if (outcome === 'committed') {
      await this.ds.transaction(async (tx) => {
        await this.write(tx, args.kind, planned.filter((r) => r.action !== 'unchanged'));
        await record(tx);
        await audit(tx, { userId: args.userId, action: 'import', entity: args.kind, entityId: id, summary: `Imported ${args.fileName}: ${counts.new} new, ${counts.changed} changed, ${counts.unchanged} unchanged`, after: { counts } });
      });
      mark('written');
    } else {
      await record(m);
    }
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
    };
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

  private async references(m: EntityManager) {
    const [suppliers, threads, keys] = await Promise.all([m.find(Supplier), m.find(ThreadSpec), m.find(KeyCode)]);
    return {
      suppliers: new Map(suppliers.map((s) => [s.name.trim().toLowerCase(), s])),
      supplierNames: suppliers.map((s) => s.name),
      threads: new Map(threads.map((t) => [t.code, t])),
      threadCodes: threads.map((t) => t.code),
      keys: new Map(keys.map((k) => [k.code, k])),
      keyCodes: keys.map((k) => k.code),
    };
  }

  /** Reads the CSV as a stream, maps headers to fields and units, and validates each row like the API does. */
  private async parseRows(kind: ImportKind, text: string, delimiter: ',' | ';', refs: Awaited<ReturnType<ImportService['references']>>) {
    const parser = Readable.from([text]).pipe(parse({ delimiter, relax_column_count: true, skip_empty_lines: true, trim: true, bom: true }));
    const specs = COLUMNS.get(kind)!;
    const errors: RowError[] = [];
    const rows: Array<{ line: number; values: Record<string, unknown> }> = [];
    let header: string[] | null = null;
    let map: Array<{ spec: ColumnSpec; index: number; unit: 'mm' | 'in' | null }> = [];
    let unitIndex = -1;
    let ignoredColumns: string[] = [];
    let line = 0;
    for await (const cells of parser as AsyncIterable<string[]>) {
      line++;
      if (!header) {
        header = cells;
        const norm = cells.map(normaliseHeader);
        unitIndex = norm.findIndex((h) => h === 'unit' || h === 'lengthunit' || h === 'units');
        const used = new Set<number>([unitIndex]);
        for (const spec of specs) {
          let found = -1;
          let unit: 'mm' | 'in' | null = null;
          for (const name of spec.names) {
            if (spec.kind === 'length') {
              const mm = norm.indexOf(`${name}mm`);
              const inch = norm.indexOf(`${name}in`);
              if (mm >= 0 && !used.has(mm)) [found, unit] = [mm, 'mm'];
              else if (inch >= 0 && !used.has(inch)) [found, unit] = [inch, 'in'];
              else if (unitIndex >= 0 && norm.indexOf(name) >= 0 && !used.has(norm.indexOf(name))) found = norm.indexOf(name);
            } else if (norm.indexOf(name) >= 0 && !used.has(norm.indexOf(name))) found = norm.indexOf(name);
            if (found >= 0) break;
          }
          if (found < 0 && spec.required) {
            const hint = spec.kind === 'length' ? ` (name its unit: ${spec.names[0]}_mm or ${spec.names[0]}_in, or add a unit column)` : '';
            throw new HttpError(400, 'missing_column', `The file has no column for ${spec.field}${hint}.`, [{ field: 'file', messages: [`missing column ${spec.field}`] }]);
          }
          if (found >= 0) {
            used.add(found);
            map.push({ spec, index: found, unit });
          }
        }
        ignoredColumns = cells.filter((_c, i) => !used.has(i));
        continue;
      }
      if (cells.length > header.length) {
        errors.push({ line, column: header[header.length - 1] ?? '', reason: `has ${cells.length} cells for ${header.length} columns${delimiter === ',' ? ': a decimal comma in a comma-separated file? Use a point, or save as semicolon-separated' : ''}` });
        continue;
      }
      const values: Record<string, unknown> = {};
      let bad = false;
      const rowUnit = unitIndex >= 0 ? (cells[unitIndex] ?? '').toLowerCase() : null;
      for (const { spec, index, unit } of map) {
        const raw = (cells[index] ?? '').trim();
        const column = header[index];
        if (raw === '') {
          if (spec.required) {
            errors.push({ line, column, reason: 'is empty' });
            bad = true;
          } else values[spec.field] = null;
          continue;
        }
        if (spec.kind === 'text' || spec.kind === 'code') {
          values[spec.field] = raw;
          continue;
        }
        const n = parseNumber(raw, delimiter);
        if (n === null) {
          errors.push({ line, column, reason: `"${raw}" is not a number${raw.includes(',') ? ' (use a point for decimals, or a semicolon-separated file with decimal commas)' : ''}` });
          bad = true;
          continue;
        }
        if (spec.kind === 'length') {
          const u = unit ?? rowUnit;
          if (u !== 'mm' && u !== 'in') {
            errors.push({ line, column: header[unitIndex] ?? column, reason: `unit "${rowUnit ?? ''}" is not mm or in` });
            bad = true;
            continue;
          }
          values[spec.field] = u === 'in' ? inToMm(n) : n;
        } else values[spec.field] = n;
      }
      if (!bad) bad = !this.resolveRow(kind, values, line, header, map, refs, errors);
      if (!bad) rows.push({ line, values });
    }
    if (!header) throw new HttpError(400, 'empty_file', 'The file is empty.', [{ field: 'file', messages: ['is empty'] }]);
    return { rows, errors, ignoredColumns, header };
  }

  /** Supplier names, thread and key codes to ids; then the same validation as the API. False when rejected. */
  private resolveRow(kind: ImportKind, values: Record<string, unknown>, line: number, header: string[], map: Array<{ spec: ColumnSpec; index: number }>, refs: Awaited<ReturnType<ImportService['references']>>, errors: RowError[]): boolean {
    const col = (field: string) => header[map.find((c) => c.spec.field === field)?.index ?? -1] ?? field;
    const supplier = refs.suppliers.get(String(values.supplier).toLowerCase());
    if (!supplier) {
      errors.push({ line, column: col('supplier'), reason: `"${values.supplier}" is not a registered supplier; nearest: ${nearestCodes(String(values.supplier), refs.supplierNames).join(', ')}` });
      return false;
    }
    values.supplierId = supplier.id;
    const threadField = kind === 'drum-types' ? 'openingThread' : 'threadCode';
    if (threadField in values) {
      if (!refs.threads.has(String(values[threadField]))) {
        errors.push({ line, column: col(threadField), reason: `"${values[threadField]}" is not a known thread code; nearest: ${nearestCodes(String(values[threadField]), refs.threadCodes).join(', ')}` });
        return false;
      }
    }
    const keyField = kind === 'drum-types' ? 'openingKey' : 'keyCode';
    if (values[keyField] != null && !refs.keys.has(String(values[keyField]))) {
      errors.push({ line, column: col(keyField), reason: `"${values[keyField]}" is not a known key code${refs.keyCodes.length ? `; nearest: ${nearestCodes(String(values[keyField]), refs.keyCodes).join(', ')}` : ''}` });
      return false;
    }
    const dto =
      kind === 'drum-types'
        ? {
            ...pickKeys(values, ['supplierId', 'region', 'name', 'partNumber', 'nominalCapacityL', 'material', 'head', 'unPackagingCode', 'outsideHeightMm', 'insideDepthMm', 'outsideDiameterMm']),
            openings: [{ label: values.openingLabel, threadCode: values.openingThread, boreMm: values.openingBoreMm, keyCode: values.openingKey ?? null, position: values.openingPosition }],
          }
        : { ...values, supplier: undefined };
    delete (dto as Record<string, unknown>).supplier;
    const problem = firstProblem(validateSync(plainToInstance(DTO.get(kind)!, dto), { whitelist: true, forbidNonWhitelisted: false }));
    if (problem) {
      const field = OPENING_FIELDS.get(problem.field) ?? problem.field;
      errors.push({ line, column: col(field), reason: `${field} ${problem.message}` });
      return false;
    }
    const extra = crossFieldProblem(kind, values);
    if (extra) {
      errors.push({ line, column: col(extra.field), reason: extra.reason });
      return false;
    }
    if (kind !== 'drum-types') {
      values.threadSpecId = values.threadCode ? refs.threads.get(String(values.threadCode))?.id : undefined;
      values.keyCodeId = values.keyCode ? refs.keys.get(String(values.keyCode))!.id : null;
    } else {
      values.openingThreadId = refs.threads.get(String(values.openingThread))!.id;
      values.openingKeyId = values.openingKey ? refs.keys.get(String(values.openingKey))!.id : null;
    }
    return true;
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
        const b = (prev.openings ?? []).map((o) => sig(o as unknown as Record<string, unknown>)).sort().join(';');
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
    return rows.map((r) => ({ id: r.id, kind: r.kind, fileName: r.fileName, dryRun: r.dryRun, outcome: r.outcome, encoding: r.encoding, delimiter: r.delimiter, counts: r.counts, errors: r.errors.slice(0, 50), attachmentId: r.attachmentId, byName: r.by?.displayName ?? null, at: r.createdAt }));
  }
}

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
/** Drum-type rows carry one opening each; validation names the nested field, the file names the column. */
const OPENING_FIELDS = new Map([
  ['openings.0.label', 'openingLabel'],
  ['openings.0.threadCode', 'openingThread'],
  ['openings.0.boreMm', 'openingBoreMm'],
  ['openings.0.keyCode', 'openingKey'],
  ['openings.0.position', 'openingPosition'],
]);
const DRUM_FIELDS = ['region', 'name', 'nominalCapacityL', 'material', 'head', 'unPackagingCode', 'outsideHeightMm', 'insideDepthMm', 'outsideDiameterMm'];

function same(a: unknown, b: unknown): boolean {
  if (a == null || b == null) return a == null && b == null;
  if (typeof a === 'number' || typeof b === 'number') return Math.abs(Number(a) - Number(b)) < 1e-9;
  return String(a) === String(b);
}

function pickKeys(o: Record<string, unknown>, keys: string[]): Record<string, unknown> {
  return Object.fromEntries(keys.filter((k) => o[k] !== undefined).map((k) => [k, o[k]]));
}

/** The checks the API makes across fields, which class-validator does not express. */
function crossFieldProblem(kind: ImportKind, v: Record<string, unknown>): { field: string; reason: string } | null {
  if (kind === 'dip-tubes' && Number(v.boreMm) >= Number(v.odMm)) return { field: 'boreMm', reason: 'bore must be smaller than the outside diameter' };
  if (kind === 'connectors') {
    if (v.returnPath === 'none' && v.returnBoreMm != null) return { field: 'returnBoreMm', reason: 'must be empty when the head has no return path' };
    if (v.returnPath !== 'none' && v.returnBoreMm == null) return { field: 'returnBoreMm', reason: 'is required when the head has a return path' };
  }
  if (kind === 'drum-types' && Number(v.insideDepthMm) >= Number(v.outsideHeightMm)) return { field: 'insideDepthMm', reason: 'must be less than the outside height' };
  return null;
}

/** A number as written in the file; with semicolons as delimiter a decimal comma is unambiguous. */
export function parseNumber(raw: string, delimiter: ',' | ';'): number | null {
  let s = raw.replace(/\s/g, '');
  if (delimiter === ';' && /^-?\d+,\d+$/.test(s)) s = s.replace(',', '.');
  if (!/^-?\d+(\.\d+)?$/.test(s)) return null;
  return Number(s);
}
