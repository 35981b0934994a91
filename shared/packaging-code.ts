// Reads the packaging code from a UN packaging mark (UN Model Regulations 6.1.2; 49 CFR 178.502 for
// single and composite packagings, 49 CFR 178.702 for IBCs) and checks a drum record against it.
// Only codes listed in shared/packaging-table.ts exist; the rest of the mark is read in packaging-mark.ts.

import { codesOf, PACKAGING_CODES, type PackagingCodeEntry, type PackagingGroup } from './packaging-table';

export type { PackagingGroup };

export interface ParsedPackagingCode {
  ok: true;
  /** Normalised code, e.g. '1A1', '31HA1' (without a W, V or T suffix). */
  code: string;
  group: PackagingGroup;
  /** The kind numeral(s): '1' to '6', or the IBC type '11', '13', '21', '31'. */
  kind: string;
  kindLabel: string;
  /** The material letter(s): 'A', or inner then outer for composites, e.g. 'HA'. */
  material: string;
  materialLabel: string;
  /** Category numeral, or null where the code has none (e.g. fibre drum 1G). */
  category: string | null;
  categoryLabel: string | null;
  /** W, V or T after the code, or null. */
  suffix: string | null;
  suffixLabel: string | null;
  /** One sentence, e.g. '1A1: steel drum, tight head (non-removable head).' */
  explanation: string;
}

export interface PackagingCodeError {
  ok: false;
  error: string;
}

export type PackagingCodeResult = ParsedPackagingCode | PackagingCodeError;

// UN Model Regulations 6.1.2.5 / 49 CFR 178.502(a)(1) [pub].
export const PACKAGING_KIND_LABELS: Readonly<Record<string, string>> = {
  '1': 'drum',
  '2': 'wooden barrel',
  '3': 'jerrican',
  '4': 'box',
  '5': 'bag',
  '6': 'composite packaging',
  '7': 'pressure receptacle',
};

// UN Model Regulations 6.1.2.6 / 49 CFR 178.502(a)(2) [pub].
export const PACKAGING_MATERIAL_LABELS: Readonly<Record<string, string>> = {
  A: 'steel',
  B: 'aluminium',
  C: 'natural wood',
  D: 'plywood',
  F: 'reconstituted wood',
  G: 'fibreboard',
  H: 'plastic',
  L: 'textile',
  M: 'multiwall paper',
  N: 'metal other than steel or aluminium',
  P: 'glass, porcelain or stoneware',
};

// 49 CFR 178.702(a) [pub]: the IBC type numerals used here.
export const IBC_TYPE_LABELS: Readonly<Record<string, string>> = {
  '11': 'rigid intermediate bulk container for solids loaded or discharged by gravity',
  '13': 'flexible intermediate bulk container for solids',
  '21': 'rigid intermediate bulk container for solids loaded or discharged under pressure',
  '31': 'rigid intermediate bulk container for liquids',
};

// Letters that may follow the code, UN Model Regulations 6.1.2.4 and 6.1.5.1.7 / 6.1.5.1.11 [mem].
export const PACKAGING_SUFFIX_LABELS: Readonly<Record<string, string>> = {
  W: 'made to a different specification accepted as equivalent by the competent authority',
  V: 'special packaging: tested with varied inner packagings',
  T: 'salvage packaging',
};

function fail(error: string): PackagingCodeError {
  return { ok: false, error };
}

/** Takes the code out of what a person may type: '1a1', 'UN 1A1/Y1.4/150/...', ' 31HA1 '. */
export function normalisePackagingCode(raw: string): string {
  return raw
    .trim()
    .toUpperCase()
    .replace(/^UN(?=[\s\d])\s*/, '')
    .split('/')[0]!
    .trim();
}

const kindWord = (kind: string) => PACKAGING_KIND_LABELS[kind] ?? IBC_TYPE_LABELS[kind] ?? kind;
const listed = (entries: PackagingCodeEntry[]) => entries.map((e) => (e.categoryLabel ? `${e.code} (${e.categoryLabel.replace(' (', ', ').replace(')', '')})` : e.code)).join(', ');
const or = (items: string[]) => (items.length < 2 ? items.join('') : `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}`);

export function parsePackagingCode(raw: string): PackagingCodeResult {
  if (typeof raw !== 'string' || raw.trim() === '') return fail('No packaging code was given.');
  const written = normalisePackagingCode(raw);
  if (written === '') return fail('No packaging code was given.');

  const shape = /^(11|13|21|31|\d)([A-Z][A-P]?)(\d)?([WVT])?$/.exec(written);
  if (!shape) {
    return fail(`"${written}" is not a packaging code: expected a kind numeral, a material letter and usually a category numeral, like 1A1 or 31HA1.`);
  }
  const [, kind, material, category, suffix] = shape as unknown as [string, string, string, string | undefined, string | undefined];
  const code = `${kind}${material}${category ?? ''}`;
  const ibc = kind.length === 2;
  if (!ibc && !PACKAGING_KIND_LABELS[kind]) return fail(`"${written}": kind numeral ${kind} is not used; kinds run from 1 (drum) to 7 (pressure receptacle).`);
  for (const letter of material) {
    if (!PACKAGING_MATERIAL_LABELS[letter]) return fail(`"${written}": material letter ${letter} is not used; the letters are A B C D F G H L M N P.`);
  }
  if (suffix && ibc) return fail(`"${written}": the letter ${suffix} after the code is for packagings, not IBCs.`);

  const entry = PACKAGING_CODES.get(code);
  if (!entry) return fail(`"${written}": ${whyMissing(kind, material, category ?? null)}`);
  return ok(entry, suffix ?? null);
}

/** Says what is wrong with a well-formed code that UN table 6.1.2.7 (or 6.5.1.4.3 for IBCs) does not list. */
function whyMissing(kind: string, material: string, category: string | null): string {
  const ofKind = codesOf(kind);
  const table = kind.length === 2 ? 'UN Model Regulations 6.5.1.4.3' : 'UN Model Regulations 6.1.2.7';
  if (ofKind.length === 0) return `no ${kindWord(kind)} has a packaging code in ${table}.`;
  if (kind === '6' && material.length !== 2) return 'a composite packaging needs two material letters, inner then outer, like 6HA1.';
  if (kind !== '6' && !ofKind.some((e) => e.material.length === material.length)) return 'only composite packagings (kind 6) and composite IBCs have two material letters.';
  const same = codesOf(kind, material);
  const what = material.length === 1 ? `${PACKAGING_MATERIAL_LABELS[material]} ${kindWord(kind)}` : `${kindWord(kind)} with materials ${material}`;
  if (same.length > 0) {
    if (same.every((e) => e.category === null)) return `the ${what} has no category numeral; it is written ${same[0]!.code}.`;
    if (category === null) return `a ${what} code ends in a category numeral: ${listed(same)}.`;
    return `the ${what} is written ${listed(same)}, not with ${category}.`;
  }
  const materials = [...new Set(ofKind.filter((e) => e.material.length === material.length).map((e) => e.material))];
  const made = or(materials.map((m) => (m.length === 1 ? `${PACKAGING_MATERIAL_LABELS[m]} (${kind}${m})` : `${kind}${m}`)));
  return `there is no ${what} in ${table}; a ${kindWord(kind)} is ${made}.`;
}

function materialLabelOf(e: PackagingCodeEntry): string {
  const label = (l: string) => PACKAGING_MATERIAL_LABELS[l]!;
  if (e.group === 'composite') return `${label(e.material[0]!)} inner receptacle ${e.categoryLabel}`;
  if (e.group === 'ibc' && e.material.length === 2) return `${label(e.material[0]!)} inner receptacle in a ${label(e.material[1]!)} outer casing`;
  return label(e.material);
}

function ok(e: PackagingCodeEntry, suffix: string | null): ParsedPackagingCode {
  const kindLabel = kindWord(e.kind);
  const materialLabel = materialLabelOf(e);
  const categoryLabel = e.group === 'composite' ? (e.category === null ? null : `outer packaging form ${e.category}`) : e.categoryLabel;
  const suffixLabel = suffix ? PACKAGING_SUFFIX_LABELS[suffix]! : null;
  const what = e.group === 'single' ? `${materialLabel} ${kindLabel}` : `${kindLabel}, ${materialLabel}`;
  const shown = e.group === 'composite' ? null : categoryLabel;
  const explanation = `${e.code}${suffix ?? ''}: ${what}${shown ? `, ${shown}` : ''}${suffixLabel ? `; ${suffix}: ${suffixLabel}` : ''}.`;
  return { ok: true, code: e.code, group: e.group, kind: e.kind, kindLabel, material: e.material, materialLabel, category: e.category, categoryLabel, suffix, suffixLabel, explanation };
}

// ---------------------------------------------------------------------------------------------------
// Checking a drum record against its declared code.

export type DrumMaterial = 'steel' | 'plastic' | 'fibre' | 'aluminium' | 'other';
export type DrumHead = 'tight' | 'open';
export type FindingOutcome = 'pass' | 'caution' | 'fail';

export interface PackagingFinding {
  check: 'code' | 'kind' | 'material' | 'head';
  outcome: FindingOutcome;
  message: string;
}

const MATERIAL_LETTER: Record<Exclude<DrumMaterial, 'other'>, string> = {
  steel: 'A',
  aluminium: 'B',
  plastic: 'H',
  fibre: 'G',
};

const HEAD_CATEGORY: Record<DrumHead, string> = { tight: '1', open: '2' };
const HEAD_WORDS: Record<DrumHead, string> = {
  tight: 'tight head (bungs in a fixed top)',
  open: 'open head (removable lid)',
};

/** Checks that the declared UN code agrees with what the drum record says the drum is. */
export function checkDrumPackagingCode(input: { code: string; material: DrumMaterial; head: DrumHead }): PackagingFinding[] {
  const parsed = parsePackagingCode(input.code);
  if (!parsed.ok) return [{ check: 'code', outcome: 'fail', message: parsed.error }];

  const findings: PackagingFinding[] = [{ check: 'code', outcome: 'pass', message: parsed.explanation }];

  if (parsed.group !== 'single' || parsed.kind !== '1') {
    const what = parsed.group === 'ibc' ? 'an intermediate bulk container' : `a ${parsed.kindLabel}`;
    findings.push({ check: 'kind', outcome: 'fail', message: `The code ${parsed.code} is for ${what}, not a drum.` });
    return findings;
  }
  findings.push({ check: 'kind', outcome: 'pass', message: `The code ${parsed.code} is for a drum.` });

  if (input.material === 'other') {
    // 'other' covers the drum materials without their own choice here: other metal (N) and plywood (D).
    const outcome: FindingOutcome = parsed.material === 'N' || parsed.material === 'D' ? 'pass' : 'fail';
    findings.push({
      check: 'material',
      outcome,
      message:
        outcome === 'pass'
          ? `The code says ${parsed.materialLabel}, which fits a drum recorded as other material.`
          : `The code ${parsed.code} says ${parsed.materialLabel}, but the drum is recorded as other material; correct the record or the code.`,
    });
  } else {
    const expected = MATERIAL_LETTER[input.material];
    findings.push(
      parsed.material === expected
        ? { check: 'material', outcome: 'pass', message: `The code says ${parsed.materialLabel}, as recorded.` }
        : {
            check: 'material',
            outcome: 'fail',
            message: `The code ${parsed.code} is for a ${parsed.materialLabel} drum, but this drum is recorded as ${input.material}; check the mark on the drum and correct one of them.`,
          },
    );
  }

  if (parsed.category === null) {
    findings.push({
      check: 'head',
      outcome: 'caution',
      message: `A ${parsed.materialLabel} drum code does not say tight or open head; check the drum itself.`,
    });
  } else if (parsed.category === HEAD_CATEGORY[input.head]) {
    findings.push({ check: 'head', outcome: 'pass', message: `The code says ${parsed.categoryLabel}, as recorded.` });
  } else {
    findings.push({
      check: 'head',
      outcome: 'fail',
      message: `The code ${parsed.code} says ${parsed.categoryLabel}, but this drum is recorded as ${HEAD_WORDS[input.head]}; check the mark on the drum and correct one of them.`,
    });
  }
  return findings;
}
