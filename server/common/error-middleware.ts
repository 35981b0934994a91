import type { ErrorRequestHandler } from 'express';
import { MulterError } from 'multer';
import { QueryFailedError } from 'typeorm';
import { HttpError } from './errors';
import { isConnectionError } from '../db/connection-errors';

/** What body-parser's (and the router's) 4xx errors mean, in words a person can act on. */
// Each answered with its own status: body-parser passes some on as a 400 whatever their own status was.
const READ_ERRORS = new Map<string, { status: number; code: string; message: string; field: string; says: string }>([
  ['entity.parse.failed', { status: 400, code: 'malformed_json', message: 'The request body is not valid JSON.', field: 'body', says: 'must be valid JSON' }],
  ['entity.too.large', { status: 413, code: 'too_large', message: 'The request body is too large.', field: 'body', says: 'is too large' }],
  [
    'encoding.unsupported',
    {
      status: 415,
      code: 'unsupported_encoding',
      message: 'The body is compressed in a way this server does not read; send it uncompressed, or as gzip, deflate or br.',
      field: 'Content-Encoding',
      says: 'must be gzip, deflate, br or none',
    },
  ],
  [
    'charset.unsupported',
    {
      status: 415,
      code: 'unsupported_charset',
      message: 'The body is in a character set this server does not read; send it as UTF-8.',
      field: 'Content-Type',
      says: 'must name the UTF-8 character set, or none',
    },
  ],
  ['request.aborted', { status: 400, code: 'incomplete_body', message: 'The request body was cut off before it ended; send it again.', field: 'body', says: 'was cut off' }],
  [
    'request.size.invalid',
    { status: 400, code: 'incomplete_body', message: 'The request body is not as long as its Content-Length says; send it again.', field: 'body', says: 'does not match its Content-Length' },
  ],
]);

type ErrorBody = { status: number; code: string; message: string; details: unknown };

/** Errors from the HTTP layer (body parsing, decompression, %-decoding of the path) that are the request's fault. */
function requestError(err: { status?: unknown; statusCode?: unknown; type?: unknown; expose?: unknown }): ErrorBody | null {
  const status = Number(err.status ?? err.statusCode);
  if (!(status >= 400 && status < 500)) return null;
  const known = typeof err.type === 'string' ? READ_ERRORS.get(err.type) : undefined;
  if (known) return { status: known.status, code: known.code, message: known.message, details: [{ field: known.field, messages: [known.says] }] };
  if (err instanceof URIError) return { status: 400, code: 'bad_path', message: 'The address holds a malformed %-escape.', details: [{ field: 'path', messages: ['holds a malformed %-escape'] }] };
  if (err.expose === false) return null;
  // A broken gzip, deflate or br stream lands here (zlib's error, passed on as a 400).
  return {
    status,
    code: 'unreadable_request',
    message: 'The request could not be read: its body is damaged or cut off. Send it again.',
    details: [{ field: 'body', messages: ['could not be read'] }],
  };
}

/**
 * PostgreSQL's data exceptions (class 22: text it cannot store, a number or date out of range, a value not
 * of its column's kind) are a value the request carried that no check stopped. Answered as a 400, and
 * logged, since a DTO or the input guard should have caught it first.
 */
function dataError(err: unknown): ErrorBody | null {
  if (!(err instanceof QueryFailedError)) return null;
  const code = (err.driverError as { code?: string } | undefined)?.code ?? '';
  if (!code.startsWith('22')) return null;
  console.warn('[bungwise] a value reached the database unchecked:', err.message);
  return {
    status: 400,
    code: 'invalid_value',
    message: 'A value in the request is out of range or not of the kind its field takes.',
    details: [{ field: 'request', messages: ['holds a value out of range or of the wrong kind'] }],
  };
}

/** The one place that formats errors: `{ error: { code, message, details } }`; a 500 never leaks a stack. */
export const errorMiddleware: ErrorRequestHandler = (err, _req, res, _next) => {
  const send = (e: ErrorBody) => res.status(e.status).json({ error: { code: e.code, message: e.message, details: e.details } });
  if (err instanceof HttpError) return void send({ status: err.status, code: err.code, message: err.message, details: err.details });
  const fromRequest = err && typeof err === 'object' ? requestError(err) : null;
  if (fromRequest) return void send(fromRequest);
  // multer: the upload broke a limit.
  if (err instanceof MulterError) {
    const tooLarge = err.code === 'LIMIT_FILE_SIZE';
    return void send({
      status: tooLarge ? 413 : 400,
      code: tooLarge ? 'too_large' : 'bad_upload',
      message: tooLarge ? 'The file is larger than allowed.' : `The upload was refused: ${err.message}.`,
      details: [{ field: err.field ?? 'file', messages: [tooLarge ? 'is too large' : err.message] }],
    });
  }
  // The shared computations throw RangeError for values no drum or pipe could have.
  if (err instanceof RangeError) return void send({ status: 400, code: 'invalid_value', message: err.message, details: [{ field: 'body', messages: [err.message] }] });
  if (isConnectionError(err)) return void send({ status: 503, code: 'unavailable', message: 'The database is unavailable; try again shortly.', details: null });
  if (err instanceof QueryFailedError && (err.driverError as { code?: string } | undefined)?.code === '40001') {
    return void send({ status: 409, code: 'conflict', message: 'Someone else changed this at the same time; reload and try again.', details: null });
  }
  const data = dataError(err);
  if (data) return void send(data);
  console.error('[bungwise] unexpected error', err);
  send({ status: 500, code: 'internal', message: 'Something went wrong on the server; the error was logged.', details: null });
};
