/** A problem with one field of a record: the field's path and what it must be ("must be less than the outside height"). */
export type FieldProblem = { field: string; says: string };

/** The sentence a form shows beside a field: its label, then what the rule says. */
export const sentence = (label: string, says: string): string => `${label} ${says}.`;
