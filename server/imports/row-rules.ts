import { CONNECTOR_LIMITS as HEAD, connectorProblem, RETURN_PATHS } from '../../shared/records/connector';
import { DIP_TUBE_LIMITS as TUBE, dipTubeProblem, TUBE_CHANNELS } from '../../shared/records/dip-tube';
import { DRUM_HEADS, DRUM_MATERIALS, DRUM_TYPE_LIMITS as DRUM, drumTypeProblem, OPENING_POSITIONS } from '../../shared/records/drum-type';
import { CODE_CHARS, FIELD_SAYS as SAYS, type FieldProblem as RecordProblem } from '../../shared/records/field';
import { REGIONS, SUITED_TO, type ImportKind } from '../entities';

// The API's field rules (server/registry/registry.dto.ts) as plain functions, for the import's rows: the same
// limits (shared/records/<record>.ts), the same words (FIELD_SAYS) and the same cross-field rules as the API,
// without building a class instance per row. tests/unit/import-row-rules.test.ts compares it with the DTOs on a
// corpus of good and bad rows; scripts/time-row-rules.ts times it.

export interface FieldProblem {
  field: string;
  message: string;
}

type Rule = (v: unknown) => string | null;

const isNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const mm =
  (max: number): Rule =>
  (v) =>
    !isNumber(v) ? SAYS.number : v < 0.1 ? SAYS.moreThanZero('mm') : v > max ? SAYS.atMost(max, 'mm') : null;
const name =
  (max: number): Rule =>
  (v) =>
    typeof v !== 'string' ? SAYS.text : v.length < 1 ? SAYS.required : v.length > max ? SAYS.atMost(max, 'characters') : null;
const code: Rule = (v) => (typeof v !== 'string' ? SAYS.text : v.length > CODE_CHARS ? SAYS.atMost(CODE_CHARS, 'characters') : null);
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const id: Rule = (v) => (typeof v === 'string' && UUID.test(v) ? null : SAYS.id);
const oneOf = (values: readonly string[]): Rule => {
  const says = SAYS.oneOf(values);
  return (v) => (typeof v === 'string' && values.includes(v) ? null : says);
};
/** Absent or null passes (IsOptional, ValidateIf(v !== null)); otherwise the rule. */
const nullable =
  (rule: Rule): Rule =>
  (v) =>
    v === null || v === undefined ? null : rule(v);
// DrumTypeDto stacks these decorators bottom-up, so the DTO reports the maximum first (also for a non-number or non-text).
const capacity: Rule = (v) => (!isNumber(v) || v > DRUM.nominalCapacityMaxL ? SAYS.atMost(DRUM.nominalCapacityMaxL, 'L') : v < 0.1 ? SAYS.moreThanZero('L') : null);
// class-validator's own wording, as DrumTypeDto gives no message here.
const unCode: Rule = nullable((v) =>
  typeof v !== 'string' || v.length > DRUM.unPackagingCodeChars ? `unPackagingCode must be shorter than or equal to ${DRUM.unPackagingCodeChars} characters` : null,
);

/** Field rules in the DTOs' declaration order: the first problem found is the one reported, as with the DTOs. */
type Rules = Array<[string, Rule]>;
const DIP_TUBE: Rules = [
  ['partNumber', name(TUBE.partNumberChars)],
  ['supplierId', id],
  ['threadCode', code],
  ['lengthMm', mm(TUBE.lengthMaxMm)],
  ['boreMm', mm(TUBE.boreMaxMm)],
  ['odMm', mm(TUBE.odMaxMm)],
  ['material', name(TUBE.materialChars)],
  ['keyCode', nullable(code)],
  ['channels', oneOf(TUBE_CHANNELS)],
];
const CONNECTOR: Rules = [
  ['partNumber', name(HEAD.partNumberChars)],
  ['supplierId', id],
  ['keyCode', nullable(code)],
  ['feedBoreMm', mm(HEAD.feedBoreMaxMm)],
  ['feedNominal', name(HEAD.nominalChars)],
  ['returnBoreMm', nullable(mm(HEAD.returnBoreMaxMm))],
  ['returnNominal', nullable(name(HEAD.nominalChars))],
  ['returnPath', oneOf(RETURN_PATHS)],
  ['suitedTo', oneOf(SUITED_TO)],
  ['wettedMaterials', name(HEAD.wettedMaterialsChars)],
];
const DRUM_TYPE: Rules = [
  ['supplierId', id],
  ['region', oneOf(REGIONS)],
  ['name', name(DRUM.nameChars)],
  ['partNumber', name(DRUM.partNumberChars)],
  ['nominalCapacityL', capacity],
  ['material', oneOf(DRUM_MATERIALS)],
  ['head', oneOf(DRUM_HEADS)],
  ['unPackagingCode', unCode],
  ['outsideHeightMm', mm(DRUM.outsideHeightMaxMm)],
  ['insideDepthMm', mm(DRUM.insideDepthMaxMm)],
  ['outsideDiameterMm', mm(DRUM.outsideDiameterMaxMm)],
];
/** A drum-type row's one opening, as the row's opening* fields (OpeningDto's rules). */
const OPENING: Rules = [
  ['openingLabel', name(DRUM.openingLabelChars)],
  ['openingThread', code],
  ['openingBoreMm', mm(DRUM.openingBoreMaxMm)],
  ['openingKey', nullable(code)],
  ['openingPosition', oneOf(OPENING_POSITIONS)],
];

type Across = (v: Record<string, unknown>) => RecordProblem | null;
/** Each kind's field rules, then its record's rule across fields (shared/records), the API's own. */
const KINDS = new Map<ImportKind, { rules: Rules; across: Across }>([
  ['dip-tubes', { rules: DIP_TUBE, across: dipTubeProblem }],
  ['connectors', { rules: CONNECTOR, across: connectorProblem }],
  ['drum-types', { rules: [...DRUM_TYPE, ...OPENING], across: drumTypeProblem }],
]);

function firstOf(rules: Rules, values: Record<string, unknown>): FieldProblem | null {
  for (const [field, rule] of rules) {
    const message = rule(values[field]);
    if (message) return { field, message };
  }
  return null;
}

/**
 * The first problem of one import row (its fields named as the row's values name them), or null. `cross`
 * says whether it is a rule across fields (reported without the field's name in front).
 */
export function rowProblem(kind: ImportKind, values: Record<string, unknown>): (FieldProblem & { cross: boolean }) | null {
  const { rules, across } = KINDS.get(kind)!;
  const field = firstOf(rules, values);
  if (field) return { ...field, cross: false };
  const cross = across(values);
  return cross ? { field: cross.field, message: cross.says, cross: true } : null;
}
