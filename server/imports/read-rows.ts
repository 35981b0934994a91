import { Readable } from 'node:stream';
import { plainToInstance } from 'class-transformer';
import { validateSync, type ValidationError } from 'class-validator';
import { parse } from 'csv-parse';
import type { EntityManager } from 'typeorm';
import { inToMm } from '../../shared/units';
import { dipTubeProblem } from '../../shared/records/dip-tube';
import { drumTypeProblem } from '../../shared/records/drum-type';
import { HttpError } from '../common/errors';
import { KeyCode, Supplier, ThreadSpec, type ImportKind } from '../entities';
import { nearestCodes } from '../registry/refs';
import { ConnectorDto, DipTubeDto, DrumTypeDto } from '../registry/registry.dto';
import { COLUMNS, normaliseHeader, type ColumnSpec } from './columns';

// Reading a sheet's rows: headers to fields and units, names and codes to ids, each row validated like the API.

export interface RowError {
  line: number;
  column: string;
  reason: string;
}

const DTO = new Map<ImportKind, new () => object>([
  ['dip-tubes', DipTubeDto],
  ['connectors', ConnectorDto],
  ['drum-types', DrumTypeDto],
]);

function firstProblem(errors: ValidationError[]): { field: string; message: string } | null {
  for (const e of errors) {
    if (e.constraints) return { field: e.property, message: Object.values(e.constraints)[0] };
    const inner = firstProblem(e.children ?? []);
    if (inner) return { field: `${e.property}.${inner.field}`, message: inner.message };
  }
  return null;
}

/** The registry's suppliers, thread and key codes, to resolve names and codes in a sheet. */
export async function loadReferences(m: EntityManager) {
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
export async function parseRows(kind: ImportKind, text: string, delimiter: ',' | ';', refs: References) {
  const parser = Readable.from([text]).pipe(parse({ delimiter, relax_column_count: true, skip_empty_lines: true, trim: true, bom: true }));
  const specs = COLUMNS.get(kind)!;
  const errors: RowError[] = [];
  const rows: Array<{ line: number; values: Record<string, unknown> }> = [];
  let header: string[] | null = null;
  const map: Array<{ spec: ColumnSpec; index: number; unit: 'mm' | 'in' | null }> = [];
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
      errors.push({
        line,
        column: header[header.length - 1] ?? '',
        reason: `has ${cells.length} cells for ${header.length} columns${delimiter === ',' ? ': a decimal comma in a comma-separated file? Use a point, or save as semicolon-separated' : ''}`,
      });
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
    if (!bad) bad = !resolveRow(kind, values, line, header, map, refs, errors);
    if (!bad) rows.push({ line, values });
  }
  if (!header) throw new HttpError(400, 'empty_file', 'The file is empty.', [{ field: 'file', messages: ['is empty'] }]);
  return { rows, errors, ignoredColumns, header };
}

/** Supplier names, thread and key codes to ids; then the same validation as the API. False when rejected. */
function resolveRow(kind: ImportKind, values: Record<string, unknown>, line: number, header: string[], map: Array<{ spec: ColumnSpec; index: number }>, refs: References, errors: RowError[]): boolean {
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
      errors.push({
        line,
        column: col(threadField),
        reason: `"${values[threadField]}" is not a known thread code; nearest: ${nearestCodes(String(values[threadField]), refs.threadCodes).join(', ')}`,
      });
      return false;
    }
  }
  const keyField = kind === 'drum-types' ? 'openingKey' : 'keyCode';
  if (values[keyField] != null && !refs.keys.has(String(values[keyField]))) {
    errors.push({
      line,
      column: col(keyField),
      reason: `"${values[keyField]}" is not a known key code${refs.keyCodes.length ? `; nearest: ${nearestCodes(String(values[keyField]), refs.keyCodes).join(', ')}` : ''}`,
    });
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

type References = Awaited<ReturnType<typeof loadReferences>>;

/** Drum-type rows carry one opening each; validation names the nested field, the file names the column. */
const OPENING_FIELDS = new Map([
  ['openings.0.label', 'openingLabel'],
  ['openings.0.threadCode', 'openingThread'],
  ['openings.0.boreMm', 'openingBoreMm'],
  ['openings.0.keyCode', 'openingKey'],
  ['openings.0.position', 'openingPosition'],
]);

/** The checks the API makes across fields, which class-validator does not express: the shared record rules (shared/records). */
function crossFieldProblem(kind: ImportKind, v: Record<string, unknown>): { field: string; reason: string } | null {
  const shared = kind === 'dip-tubes' ? dipTubeProblem(v) : kind === 'drum-types' ? drumTypeProblem(v) : null;
  if (shared) return { field: shared.field, reason: `${shared.field} ${shared.says}` };
  if (kind === 'connectors') {
    if (v.returnPath === 'none' && v.returnBoreMm != null) return { field: 'returnBoreMm', reason: 'must be empty when the head has no return path' };
    if (v.returnPath !== 'none' && v.returnBoreMm == null) return { field: 'returnBoreMm', reason: 'is required when the head has a return path' };
  }
  return null;
}

export function pickKeys(o: Record<string, unknown>, keys: string[]): Record<string, unknown> {
  return Object.fromEntries(keys.filter((k) => o[k] !== undefined).map((k) => [k, o[k]]));
}

/** A number as written in the file; with semicolons as delimiter a decimal comma is unambiguous. */
export function parseNumber(raw: string, delimiter: ',' | ';'): number | null {
  let s = raw.replace(/\s/g, '');
  if (delimiter === ';' && /^-?\d+,\d+$/.test(s)) s = s.replace(',', '.');
  if (!/^-?\d+(\.\d+)?$/.test(s)) return null;
  return Number(s);
}
