import type { ErrorRequestHandler } from 'express';
import { MulterError } from 'multer';
import { QueryFailedError } from 'typeorm';
import { HttpError } from './errors';
import { isConnectionError } from '../db/connection-errors';

/** The one place that formats errors: `{ error: { code, message, details } }`; a 500 never leaks a stack. */
export const errorMiddleware: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, details: err.details } });
    return;
  }
  // body-parser: malformed JSON or an oversized body.
  if (err?.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'malformed_json', message: 'The request body is not valid JSON.', details: [{ field: 'body', messages: ['must be valid JSON'] }] } });
    return;
  }
  if (err?.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'too_large', message: 'The request body is too large.', details: [{ field: 'body', messages: ['is too large'] }] } });
    return;
  }
  // multer: the upload broke a limit.
  if (err instanceof MulterError) {
    const tooLarge = err.code === 'LIMIT_FILE_SIZE';
    res.status(tooLarge ? 413 : 400).json({
      error: { code: tooLarge ? 'too_large' : 'bad_upload', message: tooLarge ? 'The file is larger than allowed.' : `The upload was refused: ${err.message}.`, details: [{ field: err.field ?? 'file', messages: [tooLarge ? 'is too large' : err.message] }] },
    });
    return;
  }
  // The shared computations throw RangeError for values no drum or pipe could have.
  if (err instanceof RangeError) {
    res.status(400).json({ error: { code: 'invalid_value', message: err.message, details: [{ field: 'body', messages: [err.message] }] } });
    return;
  }
  if (isConnectionError(err)) {
    res.status(503).json({ error: { code: 'unavailable', message: 'The database is unavailable; try again shortly.', details: null } });
    return;
  }
  if (err instanceof QueryFailedError && (err.driverError as { code?: string } | undefined)?.code === '40001') {
    res.status(409).json({ error: { code: 'conflict', message: 'Someone else changed this at the same time; reload and try again.', details: null } });
    return;
  }
  console.error('[bungwise] unexpected error', err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server; the error was logged.', details: null } });
};
