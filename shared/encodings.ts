/** The encodings a supplier's spec sheet may come in; the server refuses any other (server/imports/decode.ts). */
export const SPEC_SHEET_ENCODINGS = ['UTF-8', 'UTF-16 with a byte-order mark', 'Shift_JIS', 'Big5', 'EUC-KR', 'Windows-1252 (ISO-8859-1)'] as const;

/** The list as a phrase: "UTF-8, …, EUC-KR or Windows-1252 (ISO-8859-1)". */
export const SPEC_SHEET_ENCODINGS_TEXT = `${SPEC_SHEET_ENCODINGS.slice(0, -1).join(', ')} or ${SPEC_SHEET_ENCODINGS[SPEC_SHEET_ENCODINGS.length - 1]}`;
