import chardet from 'chardet';
import iconv from 'iconv-lite';
import { HttpError } from '../common/errors';

/** Encodings accepted besides UTF-8: the ones suppliers in Japan, Taiwan and Korea still send. */
const LEGACY: Record<string, string> = { Shift_JIS: 'Shift_JIS', Big5: 'Big5', 'EUC-KR': 'EUC-KR' };

const refuse = (message: string) => new HttpError(415, 'unsupported_encoding', message, [{ field: 'file', messages: [message] }]);

/**
 * Bytes to text. UTF-8 with or without a byte-order mark is read as it is; otherwise the encoding is
 * detected and only Shift_JIS, Big5 and EUC-KR are decoded. Anything else is refused, never guessed.
 */
export function decodeCsv(bytes: Buffer): { text: string; encoding: string } {
  if (bytes.length >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) return { text: bytes.subarray(3).toString('utf8'), encoding: 'UTF-8 (BOM)' };
  if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))) {
    throw refuse('The file is UTF-16; save it as UTF-8 CSV and upload it again.');
  }
  if (bytes.includes(0)) throw refuse('The file holds binary data, not CSV text.');
  try {
    return { text: new TextDecoder('utf-8', { fatal: true }).decode(bytes), encoding: 'UTF-8' };
  } catch {
    // Not UTF-8: detect among the legacy encodings below.
  }
  const candidates = chardet.analyse(bytes).filter((c) => LEGACY[c.name] && c.confidence >= 10);
  const best = candidates[0];
  if (!best) {
    const guess = chardet.detect(bytes) ?? 'an unknown encoding';
    throw refuse(`The file is not UTF-8, Shift_JIS, Big5 or EUC-KR (it looks like ${guess}); save it as UTF-8 CSV and upload it again.`);
  }
  return { text: iconv.decode(bytes, LEGACY[best.name]), encoding: best.name };
}

/**
 * The delimiter from the header line: comma, or semicolon (spreadsheets in decimal-comma locales write
 * these). A tab-separated file is refused rather than read as one column.
 */
export function detectDelimiter(text: string): ',' | ';' {
  const header = text.split(/\r?\n/, 1)[0] ?? '';
  const count = (ch: string) => header.split(ch).length - 1;
  if (count('\t') > count(',') && count('\t') > count(';')) throw refuse('The file is tab-separated; save it as CSV (comma- or semicolon-separated).');
  return count(';') > count(',') ? ';' : ',';
}
