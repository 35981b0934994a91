/** A problem with one field of a record: the field's path and what it must be ("must be less than the outside height"). */
export type FieldProblem = { field: string; says: string };

/** The sentence a form shows beside a field: its label, then what the rule says. */
export const sentence = (label: string, says: string): string => `${label} ${says}.`;

/** The longest code (thread, key) a record may refer to. */
export const CODE_CHARS = 40;

/**
 * The words of the one-field rules, shared by the API's DTO decorators (server/registry/registry.dto.ts) and the
 * import's plain row rules (server/imports/row-rules.ts), which must answer alike (tests/unit/import-row-rules.test.ts).
 */
export const FIELD_SAYS = {
  number: 'must be a number',
  text: 'must be text',
  required: 'is required',
  id: 'must be an id',
  /** "must be more than 0 mm" */
  moreThanZero: (unit: string) => `must be more than 0 ${unit}`,
  /** "must be at most 200 mm", "must be at most 60 characters" */
  atMost: (max: number, unit: string) => `must be at most ${max} ${unit}`,
  oneOf: (values: readonly string[]) => `must be one of ${values.join(', ')}`,
} as const;
