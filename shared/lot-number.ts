// The lot number of an arriving lot: the one rule the dock form, the label scanner and the server's DTO use.
// The column is varchar(60) (migration 1764619200000-create-operations).

export const LOT_NUMBER_MAX_LENGTH = 60;

const FIRST = String.raw`\p{L}\p{N}`;
const REST = String.raw`\p{L}\p{N}\-_./ `;
/** Starts with a letter or digit; then letters, digits, spaces and - _ . / (what drum labels print). */
export const LOT_NUMBER_PATTERN = new RegExp(`^[${FIRST}][${REST}]*$`, 'u');
const FIRST_CHAR = new RegExp(`[${FIRST}]`, 'u');
const REST_CHAR = new RegExp(`[${REST}]`, 'u');

/** The field-level messages, worded to follow the field's name ("Lot number may hold…"). */
export const LOT_NUMBER_MESSAGES = {
  required: 'is required',
  tooLong: `must be at most ${LOT_NUMBER_MAX_LENGTH} characters`,
  characters: 'may hold letters, digits, spaces and - _ . /',
} as const;

// C0 controls, DEL and C1 controls: what a scanner or a paste can bring along that no label prints.
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/u;

/** Describes a character for a sentence: control characters by their code, others quoted. */
function describeChar(ch: string): string {
  const code = ch.codePointAt(0) ?? 0;
  return CONTROL.test(ch) ? `a control character (code ${code})` : `“${ch}”`;
}

/**
 * What is wrong with a lot number, as one sentence, or null when it is fine. `text` is taken as it is;
 * callers trim first where trimming is wanted. `what` names the source in the sentence ("The code").
 */
export function lotNumberProblem(text: string, what = 'The lot number'): string | null {
  if (text.length === 0) return `${what} is empty.`;
  const control = [...text].find((ch) => CONTROL.test(ch));
  if (control) return `${what} holds ${describeChar(control)}, which no lot number holds.`;
  const length = [...text].length;
  if (length > LOT_NUMBER_MAX_LENGTH) return `${what} is ${length} characters long; a lot number has at most ${LOT_NUMBER_MAX_LENGTH}.`;
  if (!LOT_NUMBER_PATTERN.test(text)) {
    const chars = [...text];
    const first = !FIRST_CHAR.test(chars[0]);
    const bad = first ? chars[0] : (chars.find((ch) => !REST_CHAR.test(ch)) ?? chars[0]);
    const where = first ? 'starts with' : 'holds';
    return `${what} ${where} ${describeChar(bad)}; a lot number holds only letters, digits, spaces and - _ . /, and starts with a letter or digit.`;
  }
  return null;
}
