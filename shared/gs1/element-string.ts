// Splits GS1 element strings into (AI, data) pairs, in the two forms a scanner hands over: the symbol's
// own digits (variable-length fields ended by the group separator, ASCII 29, which stands for FNC1) and
// the human-readable form with each AI in brackets, "(01)09506000134352(10)LOT1".
// GS1 General Specifications §3 (AI definitions), §7.8 (processing element strings) [mem: confirm
// against the current edition].

export const GROUP_SEPARATOR = '\u001d';

/** The AIs a drum label is read for. Every other AI is skipped. */
export const READ_AIS = ['01', '10', '11', '17', '21'] as const;
export type ReadAi = (typeof READ_AIS)[number];

/**
 * Element strings of predefined length, by the AI's first two digits: the length of AI plus data
 * (§7.8.5, the predefined-length table) [mem]. Only these may be followed by the next AI without a
 * separator; every other element string (fixed length or not) ends with FNC1 unless it is last, so an
 * unknown one ends at the next group separator.
 */
export const PREDEFINED_LENGTH: Readonly<Record<string, number>> = {
  '00': 20,
  '01': 16,
  '02': 16,
  '03': 16,
  '04': 18,
  '11': 8,
  '12': 8,
  '13': 8,
  '14': 8,
  '15': 8,
  '16': 8,
  '17': 8,
  '18': 8,
  '19': 8,
  '20': 4,
  '31': 10,
  '32': 10,
  '33': 10,
  '34': 10,
  '35': 10,
  '36': 10,
  '41': 16,
};

export interface Element {
  ai: ReadAi;
  value: string;
}

export type ElementsResult = { ok: true; elements: Element[] } | { ok: false; error: string };

const isRead = (ai: string): ai is ReadAi => (READ_AIS as readonly string[]).includes(ai);

/** Reads the symbol's own form: AIs and data run together, variable-length data ended by ASCII 29. */
export function readRawElements(data: string): ElementsResult {
  const elements: Element[] = [];
  let p = 0;
  while (p < data.length) {
    // A leading FNC1 (or a separator after a predefined-length field, which is allowed) carries nothing.
    if (data[p] === GROUP_SEPARATOR) {
      p += 1;
      continue;
    }
    const prefix = data.slice(p, p + 2);
    if (!/^\d\d$/.test(prefix)) {
      return { ok: false, error: `The code does not go on as GS1 data at character ${p + 1}: an application identifier (digits) was expected there` };
    }
    const fixed = PREDEFINED_LENGTH[prefix];
    if (fixed !== undefined) {
      const whole = data.slice(p, p + fixed);
      if (whole.length < fixed || !/^\d+$/.test(whole)) {
        const short = whole.length < fixed ? 'the code ends before that' : 'the code has something else there';
        const error = isRead(prefix)
          ? `The (${prefix}) field needs ${fixed - 2} digits, and ${short}`
          : `The field starting “${prefix}” at character ${p + 1} needs ${fixed} digits in all, and ${short}`;
        return { ok: false, error };
      }
      if (isRead(prefix)) elements.push({ ai: prefix, value: whole.slice(2) });
      p += fixed;
      continue;
    }
    // Variable length (or fixed but not predefined): up to the next separator or the end.
    const end = data.indexOf(GROUP_SEPARATOR, p);
    const stop = end === -1 ? data.length : end;
    if (isRead(prefix)) elements.push({ ai: prefix, value: data.slice(p + 2, stop) });
    p = stop;
  }
  return { ok: true, elements };
}

const BRACKETED_AI = /\((\d{2,4})\)/g;

/** True when the text is in the bracketed human-readable form: it starts with "(NN)". */
export const isBracketed = (text: string) => /^\(\d{2,4}\)/.test(text);

/** Reads the human-readable form "(01)…(17)…(10)…"; spaces around the data are dropped (they are for people). */
export function readBracketedElements(text: string): ElementsResult {
  const elements: Element[] = [];
  const marks = [...text.matchAll(BRACKETED_AI)];
  for (let i = 0; i < marks.length; i += 1) {
    const mark = marks[i];
    const start = (mark.index ?? 0) + mark[0].length;
    const end = i + 1 < marks.length ? (marks[i + 1].index ?? text.length) : text.length;
    const value = text.slice(start, end).trim();
    if (value.includes(GROUP_SEPARATOR)) return { ok: false, error: `The field (${mark[1]}) holds a group separator, which the bracketed form does not use` };
    if (isRead(mark[1])) elements.push({ ai: mark[1], value });
  }
  return { ok: true, elements };
}
