// Reads the packaging code from a UN packaging mark (UN Model Regulations 6.1.2; 49 CFR 178.502 for
// single and composite packagings, 49 CFR 178.702 for IBCs) and checks a drum record against it.
// Only the code segment is read; the rest of the mark (packing group, density, year, state) is not.

export type PackagingGroup = 'single' | 'composite' | 'ibc';

export interface ParsedPackagingCode {
  ok: true;
  /** Normalised code, e.g. '1A1', '31HA1'. */
  code: string;
  group: PackagingGroup;
  /** The kind numeral(s): '1' to '7', or the IBC type '11', '13', '21', '31'. */
  kind: string;
  kindLabel: string;
  /** The material letter(s): 'A', or inner then outer for composites, e.g. 'HA'. */
  material: string;
  materialLabel: string;
  /** Category numeral, or null where the code has none (e.g. fibre drum 1G). */
  category: string | null;
  categoryLabel: string | null;
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

// Drums and jerricans of these materials must carry a head category [pub].
const HEADED_MATERIALS = new Set(['A', 'B', 'H', 'N']);
// Plywood and fibre drums carry no category numeral [mem].
const UNCATEGORISED_DRUM_MATERIALS = new Set(['D', 'G']);

const HEAD_CATEGORY_LABELS: Readonly<Record<string, string>> = {
  '1': 'tight head (non-removable head)',
  '2': 'open head (removable head)',
};

function fail(error: string): PackagingCodeError {
  return { ok: false, error };
}

function materialLabelOf(letter: string): string | undefined {
  return PACKAGING_MATERIAL_LABELS[letter];
}

/** Takes the code out of what a person may type: '1a1', 'UN 1A1/Y1.4/150/...', ' 31HA1 '. */
function normalise(raw: string): string {
  return raw
    .trim()
    .toUpperCase()
    .replace(/^UN\s*/, '')
    .split('/')[0]!
    .trim();
}

export function parsePackagingCode(raw: string): PackagingCodeResult {
  if (typeof raw !== 'string' || raw.trim() === '') return fail('No packaging code was given.');
  const code = normalise(raw);
  if (code === '') return fail('No packaging code was given.');

  const ibc = /^(11|13|21|31)([A-Z]{1,2})(\d)?$/.exec(code);
  if (ibc) return parseIbc(code, ibc[1]!, ibc[2]!, ibc[3] ?? null);

  const single = /^(\d)([A-Z]{1,2})(\d)?$/.exec(code);
  if (!single) {
    return fail(`"${code}" is not a packaging code: expected a kind numeral, a material letter and usually a category numeral, like 1A1 or 31HA1.`);
  }
  const kind = single[1]!;
  const material = single[2]!;
  const category = single[3] ?? null;
  const kindLabel = PACKAGING_KIND_LABELS[kind];
  if (!kindLabel) return fail(`"${code}": kind numeral ${kind} is not used; kinds run from 1 (drum) to 7 (pressure receptacle).`);

  for (const letter of material) {
    if (!materialLabelOf(letter)) {
      return fail(`"${code}": material letter ${letter} is not used; the letters are A B C D F G H L M N P.`);
    }
  }

  if (kind === '6') {
    // Composite: inner receptacle letter, then outer packaging letter, then the outer packaging's form [mem].
    if (material.length !== 2) return fail(`"${code}": a composite packaging needs two material letters, inner then outer, like 6HA1.`);
    if (category === null) return fail(`"${code}": a composite packaging code ends in a category numeral, like 6HA1.`);
    const materialLabel = `${materialLabelOf(material[0]!)} inner receptacle in a ${materialLabelOf(material[1]!)} outer packaging`;
    const categoryLabel = `outer packaging form ${category}`;
    return ok(code, 'composite', kind, kindLabel, material, materialLabel, category, categoryLabel);
  }

  if (material.length !== 1) return fail(`"${code}": only composite packagings (kind 6) and IBCs have two material letters.`);
  const materialLabel = materialLabelOf(material)!;

  if (kind === '1' || kind === '3') {
    if (HEADED_MATERIALS.has(material)) {
      if (category === null) return fail(`"${code}": a ${materialLabel} ${kindLabel} code ends in 1 (tight head) or 2 (open head).`);
      const categoryLabel = HEAD_CATEGORY_LABELS[category];
      if (!categoryLabel) return fail(`"${code}": the last numeral of a ${kindLabel} code is 1 (tight head) or 2 (open head), not ${category}.`);
      return ok(code, 'single', kind, kindLabel, material, materialLabel, category, categoryLabel);
    }
    if (kind === '1' && UNCATEGORISED_DRUM_MATERIALS.has(material)) {
      if (category !== null) return fail(`"${code}": a ${materialLabel} drum code has no category numeral; it is written 1${material}.`);
      return ok(code, 'single', kind, kindLabel, material, materialLabel, null, null);
    }
    return fail(`"${code}": ${materialLabel} is not a material used for a ${kindLabel}.`);
  }

  if (kind === '2') {
    if (material !== 'C') return fail(`"${code}": wooden barrels are natural wood, written 2C1 or 2C2.`);
    const categoryLabel = category === '1' ? 'bung type' : category === '2' ? 'removable head' : undefined;
    if (!categoryLabel) return fail(`"${code}": a wooden barrel code ends in 1 (bung type) or 2 (removable head).`);
    return ok(code, 'single', kind, kindLabel, material, materialLabel, category, categoryLabel);
  }

  // Boxes, bags and pressure receptacles are read but their categories are not spelled out here:
  // a drum registry never relies on them.
  return ok(code, 'single', kind, kindLabel, material, materialLabel, category, category === null ? null : `category ${category}`);
}

function parseIbc(code: string, type: string, material: string, category: string | null): PackagingCodeResult {
  for (const letter of material) {
    if (!materialLabelOf(letter)) {
      return fail(`"${code}": material letter ${letter} is not used; the letters are A B C D F G H L M N P.`);
    }
  }
  const kindLabel = IBC_TYPE_LABELS[type]!;
  if (material.length === 2) {
    // 49 CFR 178.702(b): composite IBC, inner receptacle letter then outer casing letter, then 1 for a
    // rigid plastic inner receptacle or 2 for a flexible one [pub for 31HA1; mem for the rest].
    if (material[0] !== 'H') return fail(`"${code}": a composite IBC has a plastic (H) inner receptacle, written like 31HA1.`);
    const categoryLabel = category === '1' ? 'rigid inner receptacle' : category === '2' ? 'flexible inner receptacle' : undefined;
    if (!categoryLabel) return fail(`"${code}": a composite IBC code ends in 1 (rigid inner receptacle) or 2 (flexible inner receptacle).`);
    const materialLabel = `${materialLabelOf('H')} inner receptacle in a ${materialLabelOf(material[1]!)} outer casing`;
    return ok(code, 'ibc', type, kindLabel, material, materialLabel, category, categoryLabel);
  }
  const materialLabel = materialLabelOf(material)!;
  return ok(code, 'ibc', type, kindLabel, material, materialLabel, category, category === null ? null : `category ${category}`);
}

function ok(code: string, group: PackagingGroup, kind: string, kindLabel: string, material: string, materialLabel: string, category: string | null, categoryLabel: string | null): ParsedPackagingCode {
  const what = group === 'single' ? `${materialLabel} ${kindLabel}` : `${kindLabel}, ${materialLabel}`;
  const explanation = `${code}: ${what}${categoryLabel ? `, ${categoryLabel}` : ''}.`;
  return { ok: true, code, group, kind, kindLabel, material, materialLabel, category, categoryLabel, explanation };
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
