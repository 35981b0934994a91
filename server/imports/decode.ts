import iconv from 'iconv-lite';
import { chardet as detector } from 'jschardet';
import { SPEC_SHEET_ENCODINGS_TEXT } from '../../shared/encodings';
import { HttpError } from '../common/errors';

/**
 * The legacy encodings a spec sheet is read in, by the detector's (lower-cased) name: the name the answer and
 * the import record give, and the iconv-lite codec. The detector names the Windows supersets (CP932, CP949),
 * which are what spreadsheets write for Shift_JIS and EUC-KR. Big5 is read as Taiwan's CP950, without the
 * Hong Kong additions: Shift_JIS bytes read as those give rare characters that round-trip. ISO-8859-1 files
 * are reported as Windows-1252, as the WHATWG Encoding Standard does with that label: the two agree on every
 * printable character ISO-8859-1 has.
 */
const READ_AS: Record<string, { label: string; codec: string }> = {
  'windows-1252': { label: 'Windows-1252', codec: 'windows-1252' },
  'iso-8859-1': { label: 'Windows-1252', codec: 'windows-1252' },
  cp932: { label: 'Shift_JIS', codec: 'shiftjis' },
  shift_jis: { label: 'Shift_JIS', codec: 'shiftjis' },
  big5: { label: 'Big5', codec: 'cp950' },
  cp949: { label: 'EUC-KR', codec: 'cp949' },
  'euc-kr': { label: 'EUC-KR', codec: 'cp949' },
};

/**
 * How far (as a share of its score) the detector's choice must lead the nearest candidate that reads the file
 * as a different text. Below it the detector cannot tell two readings apart and the file is refused. Measured
 * on generated sheets in each encoding (DEVELOPERS.md, "Spec-sheet encodings").
 */
export const MIN_LEAD = 0.05;
/** The detector reads this much; a larger file gives it the lines that hold non-ASCII bytes, up to this much. */
const EVIDENCE_BYTES = 64 * 1024;
/** Candidates compared against the choice; further down the list they score far below it. */
const RIVALS = 12;

const fileProblem = (status: number, code: string, message: string) => new HttpError(status, code, message, [{ field: 'file', messages: [message] }]);
const unsupported = (message: string) => fileProblem(415, 'unsupported_encoding', message);
const uncertain = (message: string) => fileProblem(400, 'encoding_uncertain', `${message} Save the file as UTF-8 CSV and upload it again.`);

export interface Decoded {
  text: string;
  /** What the file was read as: UTF-8, UTF-8 (BOM), UTF-16LE (BOM), UTF-16BE (BOM), Shift_JIS, Big5, EUC-KR or Windows-1252. */
  encoding: string;
}

/**
 * Bytes to text. A byte-order mark decides (UTF-8, UTF-16); text that is valid UTF-8 is UTF-8; anything else
 * goes to the detector (jschardet) and is read only when it names one of the legacy encodings above with a
 * clear lead. Whatever is read must re-encode to the same bytes and hold no U+FFFD or C1 control character,
 * or it is refused: text a wrong guess produced is never committed.
 */
export function decodeCsv(bytes: Buffer): Decoded {
  if (startsWith(bytes, [0xef, 0xbb, 0xbf])) return checked(bytes.subarray(3), 'utf8', 'UTF-8 (BOM)');
  if (startsWith(bytes, [0xff, 0xfe])) return checked(bytes.subarray(2), 'utf-16le', 'UTF-16LE (BOM)');
  if (startsWith(bytes, [0xfe, 0xff])) return checked(bytes.subarray(2), 'utf-16be', 'UTF-16BE (BOM)');
  if (bytes.includes(0)) throw unsupported('The file holds binary data, not CSV text (or UTF-16 without a byte-order mark); save it as UTF-8 CSV and upload it again.');
  try {
    return checked(bytes, null, 'UTF-8', new TextDecoder('utf-8', { fatal: true }).decode(bytes));
  } catch (err) {
    if (err instanceof HttpError) throw err;
    // Not UTF-8: the detector decides below.
  }
  const { codec, label } = detect(bytes);
  return checked(bytes, codec, label);
}

/** The detector's choice among the legacy encodings, or a refusal that names what it saw. */
function detect(bytes: Buffer): { label: string; codec: string } {
  const sample = evidence(bytes);
  // Only the encodings in use on the web today: older families (Mac, DOS, EBCDIC) outvote real ones on short files.
  const readings = detector
    .detectAll(sample, { encodingEra: detector.EncodingEra.MODERN_WEB, ignoreThreshold: true })
    .slice(0, RIVALS)
    .map((c) => ({ name: c.encoding ?? '', confidence: c.confidence, ours: READ_AS[(c.encoding ?? '').toLowerCase()], text: readAs(sample, c.encoding) }))
    // A candidate that cannot decode the bytes without replacement marks is no reading of them.
    .filter((r) => r.text !== null && !r.text.includes('\ufffd'));
  const top = readings[0];
  if (!top) throw unsupported(`The file is not text in ${SPEC_SHEET_ENCODINGS_TEXT}; save it as UTF-8 CSV and upload it again.`);
  // Code pages that agree on every byte of this file are one reading, not a doubt (ü is 0xFC in six of them).
  const rival = readings.find((r) => r.text !== top.text);
  const lead = rival ? (top.confidence - rival.confidence) / top.confidence : 1;
  if (rival && lead < MIN_LEAD) {
    throw uncertain(`The file's encoding is unclear: it reads as ${top.name} hardly better than as ${rival.name} (lead under ${MIN_LEAD * 100}%), and the two give different text.`);
  }
  const readable = readings.find((r) => r.ours && r.text === top.text);
  if (!readable) throw unsupported(`The file looks like ${top.name}; Bungwise reads ${SPEC_SHEET_ENCODINGS_TEXT}. Save it as UTF-8 CSV and upload it again.`);
  return readable.ours;
}

/** The checks every reading passes before its text is used; `known` is text already decoded strictly (UTF-8). */
function checked(bytes: Buffer, codec: string | null, label: string, known?: string): Decoded {
  const text = known ?? iconv.decode(bytes, codec!, { stripBOM: false });
  const bad = NOT_TEXT.exec(text);
  if (bad) {
    const code = `U+${bad[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}`;
    const what = bad[0] === '\ufffd' ? 'U+FFFD, the mark for bytes that could not be read' : /[\ud800-\udfff]/.test(bad[0]) ? `half of a UTF-16 pair (${code})` : `the control character ${code}`;
    throw uncertain(`Read as ${label}, line ${lineOf(text, bad.index)} holds ${what}: the file is in another encoding, or was damaged before.`);
  }
  if (codec && !iconv.encode(text, codec).equals(bytes)) {
    throw uncertain(`Read as ${label}, the text does not convert back to the same bytes, so that is not the file's encoding.`);
  }
  // Western text has its accented letters inside Latin words; a run of them is double-byte text read one byte at a time.
  // eslint-disable-next-line no-control-regex -- the class is everything outside ASCII, NUL included in its range
  const run = label === 'Windows-1252' ? /[^\x00-\x7f]{4,}/.exec(text) : null;
  if (run) throw uncertain(`Read as ${label}, line ${lineOf(text, run.index)} holds "${run[0].slice(0, 12)}", which is not Western text: the file is in another encoding.`);
  return { text, encoding: label };
}

/** What a wrong reading leaves in text: NUL, C1 controls, replacement marks and unpaired UTF-16 halves. */
// eslint-disable-next-line no-control-regex -- NUL is one of the marks of a wrong reading
const NOT_TEXT = /[\u0000\u0080-\u009f\ufffd]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/** The bytes the detector reads: a small file whole; of a large one, the lines that hold non-ASCII bytes. */
function evidence(bytes: Buffer): Buffer {
  if (bytes.length <= EVIDENCE_BYTES) return bytes;
  const lines: Buffer[] = [];
  let size = 0;
  for (let start = 0; start < bytes.length && size < EVIDENCE_BYTES;) {
    const nl = bytes.indexOf(0x0a, start);
    const end = nl < 0 ? bytes.length : nl + 1;
    const line = bytes.subarray(start, end);
    if (line.some((b) => b >= 0x80)) {
      lines.push(line);
      size += line.length;
    }
    start = end;
  }
  return Buffer.concat(lines).subarray(0, EVIDENCE_BYTES);
}

/** The text in an encoding the detector names (through our codec for the ones we read), or null when iconv-lite has no such encoding. */
function readAs(bytes: Buffer, name: string | null): string | null {
  const codec = name && (READ_AS[name.toLowerCase()]?.codec ?? name);
  return codec && iconv.encodingExists(codec) ? iconv.decode(bytes, codec) : null;
}

const startsWith = (bytes: Buffer, prefix: number[]) => bytes.length >= prefix.length && prefix.every((b, i) => bytes[i] === b);
const lineOf = (text: string, index: number) => text.slice(0, index).split('\n').length;

/**
 * The delimiter from the header line: comma, or semicolon (spreadsheets in decimal-comma locales write
 * these). A tab-separated file is refused rather than read as one column.
 */
export function detectDelimiter(text: string): ',' | ';' {
  const header = text.split(/\r?\n/, 1)[0] ?? '';
  const count = (ch: string) => header.split(ch).length - 1;
  if (count('\t') > count(',') && count('\t') > count(';')) throw unsupported('The file is tab-separated; save it as CSV (comma- or semicolon-separated).');
  return count(';') > count(',') ? ';' : ',';
}
