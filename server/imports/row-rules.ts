import { REGIONS, SUITED_TO, type ImportKind } from '../entities';

// The API's field rules (server/registry/registry.dto.ts) as plain functions, for the import's rows: the
// same limits and the same messages as the DTOs, without building a class instance per row. Until one
// validator per record exists (shared/records/<resource>.ts), this file is the import's only entry to
// them: `rowProblem` is the one function to point there. tests/unit/import-row-rules.test.ts compares
// it with the DTOs on a corpus of good and bad rows.

export interface FieldProblem {
  field: string;
  message: string;
}

type Rule = (v: unknown) => string | null;

const NUMBER = 'must be a number';
const isNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const mm =
  (max: number): Rule =>
  (v) =>
    !isNumber(v) ? NUMBER : v < 0.1 ? 'must be more than 0 mm' : v > max ? `must be at most ${max} mm` : null;
const name =
  (max = 120): Rule =>
  (v) =>
    typeof v !== 'string' ? 'must be text' : v.length < 1 ? 'is required' : v.length > max ? `must be at most ${max} characters` : null;
const code: Rule = (v) => (typeof v !== 'string' ? 'must be text' : v.length > 40 ? 'must be at most 40 characters' : null);
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const id: Rule = (v) => (typeof v === 'string' && UUID.test(v) ? null : 'must be an id');
const oneOf =
  (values: readonly string[]): Rule =>
  (v) =>
    typeof v === 'string' && values.includes(v) ? null : `must be one of ${values.join(', ')}`;
/** Absent or null passes (IsOptional, ValidateIf(v !== null)); otherwise the rule. */
const nullable =
  (rule: Rule): Rule =>
  (v) =>
    v === null || v === undefined ? null : rule(v);
// DrumTypeDto stacks these decorators bottom-up, so the DTO reports the maximum first (also for a non-number or non-text).
const capacity: Rule = (v) => (!isNumber(v) || v > 3000 ? 'must be at most 3000 L' : v < 0.1 ? 'must be more than 0 L' : null);
// class-validator's own wording, as DrumTypeDto gives no message here.
const unCode: Rule = nullable((v) => (typeof v !== 'string' || v.length > 40 ? 'unPackagingCode must be shorter than or equal to 40 characters' : null));

/** Field rules in the DTOs' declaration order: the first problem found is the one reported, as with the DTOs. */
type Rules = Array<[string, Rule]>;
const DIP_TUBE: Rules = [
  ['partNumber', name(60)],
  ['supplierId', id],
  ['threadCode', code],
  ['lengthMm', mm(3000)],
  ['boreMm', mm(200)],
  ['odMm', mm(250)],
  ['material', name(40)],
  ['keyCode', nullable(code)],
  ['channels', oneOf(['feed', 'feed-return'])],
];
const CONNECTOR: Rules = [
  ['partNumber', name(60)],
  ['supplierId', id],
  ['keyCode', nullable(code)],
  ['feedBoreMm', mm(200)],
  ['feedNominal', name(20)],
  ['returnBoreMm', nullable(mm(200))],
  ['returnNominal', nullable(name(20))],
  ['returnPath', oneOf(['none', 'restricted', 'open'])],
  ['suitedTo', oneOf(SUITED_TO)],
  ['wettedMaterials', name(200)],
];
const DRUM_TYPE: Rules = [
  ['supplierId', id],
  ['region', oneOf(REGIONS)],
  ['name', name()],
  ['partNumber', name(60)],
  ['nominalCapacityL', capacity],
  ['material', oneOf(['steel', 'plastic', 'fibre', 'aluminium', 'other'])],
  ['head', oneOf(['tight', 'open'])],
  ['unPackagingCode', unCode],
  ['outsideHeightMm', mm(3000)],
  ['insideDepthMm', mm(3000)],
  ['outsideDiameterMm', mm(2000)],
];
/** A drum-type row's one opening, as the row's opening* fields (OpeningDto's rules). */
const OPENING: Rules = [
  ['openingLabel', name(40)],
  ['openingThread', code],
  ['openingBoreMm', mm(500)],
  ['openingKey', nullable(code)],
  ['openingPosition', oneOf(['large', 'small', 'center', 'other'])],
];
const RULES = new Map<ImportKind, Rules>([
  ['dip-tubes', DIP_TUBE],
  ['connectors', CONNECTOR],
  ['drum-types', [...DRUM_TYPE, ...OPENING]],
]);

function firstOf(rules: Rules, values: Record<string, unknown>): FieldProblem | null {
  for (const [field, rule] of rules) {
    const message = rule(values[field]);
    if (message) return { field, message };
  }
  return null;
}

/** The checks across fields that the API makes beside the field rules. */
function crossFieldProblem(kind: ImportKind, v: Record<string, unknown>): FieldProblem | null {
  if (kind === 'dip-tubes' && Number(v.boreMm) >= Number(v.odMm)) return { field: 'boreMm', message: 'bore must be smaller than the outside diameter' };
  if (kind === 'connectors') {
    if (v.returnPath === 'none' && v.returnBoreMm != null) return { field: 'returnBoreMm', message: 'must be empty when the head has no return path' };
    if (v.returnPath !== 'none' && v.returnBoreMm == null) return { field: 'returnBoreMm', message: 'is required when the head has a return path' };
  }
  if (kind === 'drum-types' && Number(v.insideDepthMm) >= Number(v.outsideHeightMm)) return { field: 'insideDepthMm', message: 'must be less than the outside height' };
  return null;
}

/**
 * The first problem of one import row (its fields named as the row's values name them), or null. `cross`
 * says whether it is a rule across fields (reported without the field's name in front).
 */
export function rowProblem(kind: ImportKind, values: Record<string, unknown>): (FieldProblem & { cross: boolean }) | null {
  const field = firstOf(RULES.get(kind)!, values);
  if (field) return { ...field, cross: false };
  const cross = crossFieldProblem(kind, values);
  return cross ? { ...cross, cross: true } : null;
}
