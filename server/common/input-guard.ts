import type { Request, RequestHandler } from 'express';
import { HttpError, ValidationFailed, type FieldProblem } from './errors';

// One guard for what no route should see: control characters (PostgreSQL refuses a NUL byte in text and
// answers an error, not a 400), broken %-escapes, prototype keys, bodies nested without end, and bodies in
// encodings the server does not read. It runs on every API request before any route, so a route added
// later is covered; the routes' own DTOs then check what each value means.

/** C0 control characters and DEL; a body's text may still hold tab, line feed and carriage return. */
// eslint-disable-next-line no-control-regex -- control characters are what these two look for
const URL_CONTROL = /[\u0000-\u001f\u007f]/;
// eslint-disable-next-line no-control-regex
const BODY_CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;
/** Half of a UTF-16 pair without the other half: not a character, and stored as U+FFFD without a word. */
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
/** Keys that write to an object's prototype when assigned; no field of ours is named so. */
const PROTOTYPE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);
/** Deep enough for every body the API takes (a drum's openings are three levels down). */
export const MAX_BODY_DEPTH = 12;
/** What express.json decompresses; anything else is refused before a route reads the body. */
const READABLE_ENCODINGS = new Set(['identity', 'gzip', 'deflate', 'br']);

const CONTROL_MESSAGE = 'must not contain control characters (such as a NUL byte)';

function textProblem(text: string, field: string, control: RegExp): FieldProblem | null {
  if (control.test(text)) return { field, messages: [CONTROL_MESSAGE] };
  if (LONE_SURROGATE.test(text)) return { field, messages: ['must be well-formed text (it holds half of a character)'] };
  return null;
}

const join = (prefix: string, key: string) => (prefix ? `${prefix}.${key}` : key);

/** The first value in a parsed body (or form fields) that no route should see, named by its path. */
export function bodyProblem(value: unknown, field = '', depth = 0): FieldProblem | null {
  if (typeof value === 'string') return textProblem(value, field || 'body', BODY_CONTROL);
  if (value === null || typeof value !== 'object') return null;
  // Named by its outermost field (a path twelve levels long helps nobody), or as the body itself.
  if (depth >= MAX_BODY_DEPTH) return { field: /^\d*$/.test(field.split('.')[0]) ? 'body' : field.split('.')[0], messages: [`is nested too deeply (more than ${MAX_BODY_DEPTH} levels)`] };
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const p = bodyProblem(value[i], join(field, String(i)), depth + 1);
      if (p) return p;
    }
    return null;
  }
  for (const key of Object.keys(value)) {
    const name = join(field, key);
    if (PROTOTYPE_KEYS.has(key)) return { field: name, messages: ['is not a field this request takes'] };
    const p = textProblem(key, name, BODY_CONTROL) ?? bodyProblem((value as Record<string, unknown>)[key], name, depth + 1);
    if (p) return p;
  }
  return null;
}

/** Decodes one %-encoded piece of a URL, or returns null when its escapes are malformed or not UTF-8. */
function decode(piece: string): string | null {
  try {
    return decodeURIComponent(piece);
  } catch {
    return null;
  }
}

function pathProblem(req: Request): FieldProblem | null {
  for (const segment of req.path.split('/')) {
    const text = decode(segment);
    if (text === null) return { field: 'path', messages: ['holds a malformed %-escape'] };
    const p = textProblem(text, 'path', URL_CONTROL);
    if (p) return p;
  }
  return null;
}

/** Checks the raw query string, since Express's parser turns broken escapes into U+FFFD silently. */
function queryProblem(req: Request): FieldProblem | null {
  const raw = req.originalUrl.includes('?') ? req.originalUrl.slice(req.originalUrl.indexOf('?') + 1) : '';
  for (const pair of raw.split('&')) {
    if (!pair) continue;
    const eq = pair.indexOf('=');
    const [rawName, rawValue] = eq < 0 ? [pair, ''] : [pair.slice(0, eq), pair.slice(eq + 1)];
    const name = decode(rawName.replace(/\+/g, ' '));
    if (name === null) return { field: 'query', messages: ['holds a parameter name with a malformed %-escape'] };
    const value = decode(rawValue.replace(/\+/g, ' '));
    if (value === null) return { field: name, messages: ['holds a malformed %-escape'] };
    if (PROTOTYPE_KEYS.has(name)) return { field: name, messages: ['is not a parameter this request takes'] };
    const p = textProblem(name, name || 'query', URL_CONTROL) ?? textProblem(value, name, URL_CONTROL);
    if (p) return p;
  }
  return null;
}

function encodingProblem(req: Request): HttpError | null {
  const encoding = (req.headers['content-encoding'] ?? 'identity').trim().toLowerCase();
  const refuse = (message: string) => new HttpError(415, 'unsupported_encoding', message, [{ field: 'Content-Encoding', messages: [message] }]);
  if (encoding !== 'identity' && req.is('multipart')) return refuse('An upload must be sent uncompressed.');
  if (!READABLE_ENCODINGS.has(encoding)) return refuse(`The body is compressed as "${encoding.slice(0, 40)}", which this server does not read; send it uncompressed, or as gzip, deflate or br.`);
  // A body of length 0 (what a browser sends with a bare POST) is no body.
  const hasBody = req.headers['transfer-encoding'] !== undefined || Number(req.headers['content-length']) > 0;
  if (hasBody && !req.is(['json', 'multipart'])) {
    return new HttpError(415, 'unsupported_type', 'Send the body as JSON (Content-Type: application/json), or a file as multipart/form-data.', [
      { field: 'Content-Type', messages: ['must be application/json or multipart/form-data'] },
    ]);
  }
  return null;
}

/** Before the body is read: the path, the query and the body's encoding. */
export const requestGuard: RequestHandler = (req, _res, next) => {
  const encoding = encodingProblem(req);
  if (encoding) return next(encoding);
  const problem = pathProblem(req) ?? queryProblem(req);
  next(problem ? new ValidationFailed([problem]) : undefined);
};

/** The path alone, for the web app's files and client routes (the static server answers malformed escapes in its own words). */
export const pathGuard: RequestHandler = (req, _res, next) => {
  const problem = pathProblem(req);
  next(problem ? new ValidationFailed([problem]) : undefined);
};

/** After express.json: every string and key of the body, and how deep it goes. */
export const bodyGuard: RequestHandler = (req, _res, next) => {
  const problem = req.body !== undefined ? bodyProblem(req.body) : null;
  next(problem ? new ValidationFailed([problem]) : undefined);
};
