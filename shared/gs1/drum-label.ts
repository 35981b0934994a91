// What a drum label's barcode says: the GTIN, batch (the lot number), production and expiry dates and the
// serial from GS1 element strings, or a plain-text code taken as the lot number. The dock's scanner and any
// later check on the lot read labels through this one function.
import { lotNumberProblem } from '../lot-number';
import { hasValidCheckDigit, gs1CheckDigit } from './check-digit';
import { parseGs1Date } from './dates';
import { GROUP_SEPARATOR, isBracketed, readBracketedElements, readRawElements, type Element, type ElementsResult } from './element-string';

export interface DrumLabel {
  /** 'gs1' when the code held GS1 element strings; 'text' when the whole code is the lot number. */
  kind: 'gs1' | 'text';
  /** AI (01), 14 digits with a verified check digit. */
  gtin: string | null;
  /** AI (10), or the whole plain-text code. */
  batch: string | null;
  /** AI (11), YYYY-MM-DD. */
  productionDate: string | null;
  /** AI (17), YYYY-MM-DD. */
  expiryDate: string | null;
  /** AI (21). */
  serial: string | null;
}

export type DrumLabelResult = ({ ok: true } & DrumLabel) | { ok: false; error: string };

/** Symbology identifiers that announce GS1 data (ISO/IEC 15424): GS1-128, GS1 DataMatrix, GS1 QR Code, GS1 DataBar. */
const GS1_SYMBOLOGIES = [']C1', ']d2', ']Q3', ']e0'];
const SYMBOLOGY_ID = /^\][A-Za-z][0-9A-Za-z]/;
/** GS1 AI encodable character set 82 (§7.11, figure 7.11-1), which batch and serial data are drawn from. */
const SET_82 = /^[!"%&'()*+,\-./0-9:;<=>?A-Z_a-z]*$/;
const VARIABLE_MAX = 20;

const fail = (error: string): DrumLabelResult => ({ ok: false, error: error.endsWith('.') ? error : `${error}.` });

/**
 * Reads decoded barcode text. GS1 data is recognised by its symbology identifier (]C1, ]d2, ]Q3), by a
 * leading or embedded group separator (ASCII 29), by the bracketed form "(01)…", or, with no identifier
 * at all (as some decoders hand it over), by starting with (01) and a GTIN whose check digit holds.
 * Anything else is a plain-text code, taken as the lot number when the lot-number rule allows it.
 * `today` decides the century of two-digit years (GS1 §7.12).
 */
export function parseDrumLabel(decoded: string, today: Date = new Date()): DrumLabelResult {
  const text = decoded.replace(/^[\r\n\t ]+|[\r\n\t ]+$/g, '');
  if (text.length === 0) return fail('The code is empty');
  const id = SYMBOLOGY_ID.exec(text)?.[0] ?? null;
  const body = id ? text.slice(id.length) : text;
  let read: ElementsResult | null = null;
  if (isBracketed(body)) read = readBracketedElements(body);
  else if ((id && GS1_SYMBOLOGIES.includes(id)) || (!id && looksLikeBareGs1(body))) read = readRawElements(body);
  if (!read) return plainText(body);
  if (!read.ok) return fail(read.error);
  return fromElements(read.elements, today);
}

function looksLikeBareGs1(body: string): boolean {
  if (body.includes(GROUP_SEPARATOR)) return true;
  return /^01\d{14}/.test(body) && hasValidCheckDigit(body.slice(2, 16));
}

function plainText(body: string): DrumLabelResult {
  const trimmed = body.trim();
  const problem = lotNumberProblem(trimmed, 'The code');
  if (problem) return fail(problem);
  return { ok: true, kind: 'text', gtin: null, batch: trimmed, productionDate: null, expiryDate: null, serial: null };
}

/** The dated elements and the label field each fills: production date (11) and expiry date (17). */
const DATE_FIELDS = [
  ['11', 'productionDate'],
  ['17', 'expiryDate'],
] as const;
/** The variable-length text elements and the label field each fills: batch or lot (10) and serial (21). */
const TEXT_FIELDS = [
  ['10', 'batch'],
  ['21', 'serial'],
] as const;

const NAMES: Record<Element['ai'], string> = {
  '01': 'GTIN (01)',
  '10': 'batch or lot (10)',
  '11': 'production date (11)',
  '17': 'expiry date (17)',
  '21': 'serial (21)',
};

function fromElements(elements: Element[], today: Date): DrumLabelResult {
  if (elements.length === 0) return fail('The code is GS1 data without a GTIN, batch, date or serial: nothing a drum label is read for');
  const seen = new Map<Element['ai'], string>();
  for (const { ai, value } of elements) {
    const before = seen.get(ai);
    if (before !== undefined && before !== value) return fail(`The code holds two different values for the ${NAMES[ai]}: ${before} and ${value}`);
    seen.set(ai, value);
  }
  const label: DrumLabel = { kind: 'gs1', gtin: null, batch: null, productionDate: null, expiryDate: null, serial: null };

  const gtin = seen.get('01');
  if (gtin !== undefined) {
    if (!/^\d{14}$/.test(gtin)) return fail(`The ${NAMES['01']} must be 14 digits; the code has “${gtin}”`);
    if (!hasValidCheckDigit(gtin)) return fail(`The ${NAMES['01']} ${gtin} fails its check digit: with these first 13 digits the last one would be ${gs1CheckDigit(gtin.slice(0, 13))}`);
    label.gtin = gtin;
  }
  for (const [ai, key] of DATE_FIELDS) {
    const raw = seen.get(ai);
    if (raw === undefined) continue;
    const date = parseGs1Date(raw, today);
    if (!date.ok) return fail(`The ${NAMES[ai]} is not a real date: ${date.error}`);
    label[key] = date.iso;
  }
  for (const [ai, key] of TEXT_FIELDS) {
    const value = seen.get(ai);
    if (value === undefined) continue;
    const problem = variableProblem(NAMES[ai], value);
    if (problem) return fail(problem);
    label[key] = value;
  }
  if (label.batch !== null) {
    // GS1 allows characters (+, %, quotes…) that the lot-number field does not; say so rather than alter the lot.
    const problem = lotNumberProblem(label.batch, `The ${NAMES['10']} ${label.batch}`);
    if (problem) return fail(problem);
  }
  return { ok: true, ...label };
}

function variableProblem(name: string, value: string): string | null {
  if (value.length === 0) return `The ${name} is empty`;
  const length = [...value].length;
  if (length > VARIABLE_MAX) {
    return `The ${name} is ${length} characters long; GS1 allows at most ${VARIABLE_MAX} (a separator after it may be missing)`;
  }
  if (!SET_82.test(value)) return `The ${name} “${value}” holds characters GS1 does not allow there`;
  return null;
}
