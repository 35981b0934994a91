import fc from 'fast-check';
import { gzipSync } from 'node:zlib';
import { getMetadataStorage } from 'class-validator';

// Hostile input for the robustness test (tests/api/robustness.test.ts): values picked by hand because each
// class of them has broken a server before, and fast-check arbitraries that mix them with random data.

/** Keys that reach Object.prototype when looked up in (or assigned to) a plain object. */
export const PROTOTYPE_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'valueOf', 'isPrototypeOf', '__defineGetter__'];

/** Text values, raw (the test %-encodes them for a URL). */
export const HOSTILE_TEXT: string[] = [
  ...PROTOTYPE_KEYS,
  '\u0000',
  'a\u0000b',
  '\u0001\u0002',
  '\u001b[31m',
  '\u007f',
  '\ud800',
  'line\r\nbreak',
  '1e20',
  '1e308',
  '-0',
  'NaN',
  'Infinity',
  '-1',
  '0',
  '99999999999999999999',
  '0x10',
  '1.5',
  ' 7 ',
  '2024-02-30',
  '0000-01-01',
  '2024-13-01',
  '+275760-09-13',
  '2026-05-14T25:61:00Z',
  'x'.repeat(5000),
  '../../../etc/passwd',
  "'; DROP TABLE users; --",
  '%',
  '\\',
  '_%',
  'ＮＰＳ－２',
  '𝔘𝔫𝔦𝔠𝔬𝔡𝔢',
  '<script>alert(1)</script>',
  '=cmd|"/c calc"!A1',
  'null',
  'true',
  '[]',
  '{}',
  '',
  ' ',
  '00000000-0000-0000-0000-000000000000',
  'FFFFFFFF-FFFF-FFFF-FFFF-FFFFFFFFFFFF',
];

/** Path and query pieces sent as they are: malformed or unusual %-encoding a browser would not send. */
export const RAW_ENCODED = ['%E0%A4%A', '%ZZ', '%', '%FF', '%C0%AF', '%ED%A0%80', '%00', '%F0%9F%98%80', '..%2F..%2F', '%u0041', '%2e%2e', '%252F'];

/** JSON texts for whole bodies, sent as they are. */
export const HOSTILE_BODIES: string[] = [
  '[]',
  '[1,2,3]',
  'null',
  '"text"',
  '123',
  'true',
  '{"__proto__":{"polluted":true}}',
  '{"constructor":{"prototype":{"polluted":true}}}',
  '{"a":{"__proto__":{"polluted":true}}}',
  '{"x":-0}',
  '{"version":-0}',
  '{"version":1e400}',
  '{"version":1e20,"page":1e20}',
  '{"version":"1"}',
  '{"version":[1]}',
  '{"version":{"$gt":0}}',
  '{"x":"\\u0000"}',
  '{"\\u0000":"x"}',
  '{"x":"\\ud800"}',
  '{"x":',
  '{"x":1,}',
  "{'x':1}",
  '\ufeff{}',
  `{"x":"${'y'.repeat(200_000)}"}`,
  '['.repeat(50_000) + ']'.repeat(50_000),
  '{"a":'.repeat(5_000) + '1' + '}'.repeat(5_000),
  `[${Array(50_000).fill('{}').join(',')}]`,
  `{${Array.from({ length: 20_000 }, (_, i) => `"k${i}":${i}`).join(',')}}`,
];

export interface RawRequest {
  label: string;
  headers: Record<string, string>;
  body: string | Buffer;
}

const boundary = '----bungwise-boundary';
const multipart = (parts: string) => Buffer.from(parts.replace(/\n/g, '\r\n'));

/** Content types and encodings a well-behaved client never sends. */
export const HOSTILE_ENCODINGS: RawRequest[] = [
  { label: 'Content-Encoding compress', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'compress' }, body: '{}' },
  { label: 'Content-Encoding x-unknown', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'x-unknown' }, body: '{}' },
  { label: 'Content-Encoding gzip, gzip', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip, gzip' }, body: gzipSync(gzipSync('{}')) },
  { label: 'broken gzip', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, body: Buffer.from('this is not gzip at all') },
  { label: 'truncated gzip', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, body: gzipSync('{"a":"' + 'b'.repeat(1000) + '"}').subarray(0, 30) },
  { label: 'broken deflate', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'deflate' }, body: Buffer.from('not deflate') },
  { label: 'broken br', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'br' }, body: Buffer.from('not brotli') },
  { label: 'gzip bomb-ish (2 MB of zeros)', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, body: gzipSync(`{"x":"${'0'.repeat(2 * 1024 * 1024)}"}`) },
  { label: 'valid gzip of {}', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, body: gzipSync('{}') },
  { label: 'text/plain', headers: { 'Content-Type': 'text/plain' }, body: 'hello' },
  { label: 'application/xml', headers: { 'Content-Type': 'application/xml' }, body: '<a>1</a>' },
  { label: 'form-urlencoded', headers: { 'Content-Type': 'application/x-www-form-urlencoded' }, body: 'a=b&__proto__[polluted]=1&constructor[prototype][polluted]=1' },
  { label: 'no content type', headers: {}, body: '{"a":1}' },
  { label: 'json charset koi8-r', headers: { 'Content-Type': 'application/json; charset=koi8-r' }, body: '{}' },
  { label: 'json charset utf-16', headers: { 'Content-Type': 'application/json; charset=utf-16' }, body: Buffer.from('{}', 'utf16le') },
  { label: 'json charset nonsense', headers: { 'Content-Type': 'application/json; charset=no-such-charset' }, body: '{}' },
  { label: 'invalid utf-8 in json', headers: { 'Content-Type': 'application/json' }, body: Buffer.from([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xff, 0xfe, 0x22, 0x7d]) },
  { label: 'empty json', headers: { 'Content-Type': 'application/json' }, body: '' },
  { label: 'content type garbage', headers: { 'Content-Type': ';;;/' }, body: '{}' },
  { label: 'multipart without boundary', headers: { 'Content-Type': 'multipart/form-data' }, body: 'xx' },
  { label: 'multipart with empty boundary', headers: { 'Content-Type': 'multipart/form-data; boundary=' }, body: 'xx' },
  {
    label: 'multipart truncated',
    headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}` },
    body: multipart(
      `--${boundary}\nContent-Disposition: form-data; name="kind"\n\ndip-tubes\n--${boundary}\nContent-Disposition: form-data; name="file"; filename="a.csv"\nContent-Type: text/csv\n\npart_number,le`,
    ),
  },
  { label: 'multipart garbage', headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}` }, body: 'no parts here at all' },
  { label: 'multipart bad part header', headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}` }, body: multipart(`--${boundary}\nContent-Disposition\n\nx\n--${boundary}--\n`) },
  {
    label: 'multipart NUL field',
    headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}` },
    body: multipart(`--${boundary}\nContent-Disposition: form-data; name="kind"\n\ndip-tubes\u0000\n--${boundary}\nContent-Disposition: form-data; name="ownerKind"\n\n__proto__\n--${boundary}--\n`),
  },
  {
    label: 'multipart NUL file name',
    headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}` },
    body: multipart(`--${boundary}\nContent-Disposition: form-data; name="file"; filename="a\u0000.csv"\nContent-Type: text/csv\n\na,b\n--${boundary}--\n`),
  },
  {
    label: 'multipart gzip',
    headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}`, 'Content-Encoding': 'gzip' },
    body: gzipSync(multipart(`--${boundary}\nContent-Disposition: form-data; name="kind"\n\ndip-tubes\n--${boundary}--\n`)),
  },
  {
    label: 'multipart many fields',
    headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}` },
    body: multipart(Array.from({ length: 40 }, (_, i) => `--${boundary}\nContent-Disposition: form-data; name="f${i}"\n\nv\n`).join('') + `--${boundary}--\n`),
  },
  { label: 'body larger than allowed', headers: { 'Content-Type': 'application/json' }, body: `{"x":"${'z'.repeat(1_100_000)}"}` },
];

/**
 * Every property name the server's DTOs validate, read from class-validator's own registry (so a field
 * added later is fuzzed without a change here). The app must be imported before this is called.
 */
export function dtoFieldNames(): string[] {
  const storage = getMetadataStorage() as unknown as { validationMetadatas: Map<unknown, Array<{ propertyName: string }>> };
  const names = new Set<string>();
  for (const list of storage.validationMetadatas.values()) for (const m of list) names.add(m.propertyName);
  return [...names].sort();
}

/** Query parameter names to try on every route: the list parameters and whatever the DTOs take. */
export const QUERY_NAMES = [
  'q',
  'sort',
  'order',
  'page',
  'pageSize',
  'region',
  'thread',
  'key',
  'status',
  'supplierId',
  'stationId',
  'verdict',
  'from',
  'to',
  'entity',
  'entityId',
  'userId',
  'action',
  'ownerKind',
  'ownerId',
  'version',
  'kind',
  'dryRun',
];

/** %-encodes text for a URL, lone surrogates included (encodeURIComponent throws on them). */
export function pct(text: string): string {
  let out = '';
  for (const ch of text) {
    const code = ch.codePointAt(0)!;
    out += code >= 0xd800 && code <= 0xdfff ? '%ED%A0%80' : encodeURIComponent(ch);
  }
  return out;
}

const JSON_NUMBERS = [0, -1, 1, 2, 3, 1.5, 1e20, 1e308, -1e308, 2 ** 31, 2 ** 53 + 2, Number.MIN_VALUE, 2147483648];

/** A JSON value that may be hostile at any depth. */
export function hostileJson(strings: string[]): fc.Arbitrary<unknown> {
  const scalar = fc.oneof(
    fc.constantFrom(...HOSTILE_TEXT),
    fc.constantFrom(...strings),
    fc.constantFrom(...JSON_NUMBERS),
    fc.string({ unit: 'binary', maxLength: 40 }),
    fc.integer(),
    fc.double({ noNaN: true, noDefaultInfinity: true }),
    fc.boolean(),
    fc.constant(null),
  );
  return fc.oneof(
    { weight: 6, arbitrary: scalar },
    { weight: 1, arbitrary: fc.array(scalar, { maxLength: 4 }) },
    { weight: 1, arbitrary: fc.dictionary(fc.constantFrom(...PROTOTYPE_KEYS, 'value', 'unit', 'label', 'threadCode', 'x'), scalar, { maxKeys: 3 }) },
    { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
  );
}

/** A query value: hostile text, something fitting, or random; sometimes the parameter twice. */
export function hostileQueryValue(fitting: string[]): fc.Arbitrary<string[]> {
  const one = fc.oneof(
    fc.constantFrom(...HOSTILE_TEXT).map(pct),
    fc.constantFrom(...RAW_ENCODED),
    fc.constantFrom(...fitting).map(pct),
    fc.string({ unit: 'binary', maxLength: 30 }).map(pct),
    fc.integer().map(String),
  );
  return fc.oneof({ weight: 5, arbitrary: one.map((v) => [v]) }, { weight: 1, arbitrary: fc.array(one, { minLength: 2, maxLength: 3 }) });
}
