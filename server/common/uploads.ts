import type { RequestHandler } from 'express';
import multer, { MulterError } from 'multer';
import { HttpError, ValidationFailed } from './errors';
import { bodyProblem } from './input-guard';

/**
 * One file from a multipart/form-data upload, kept in memory, with its form fields. multer passes the
 * parser's own errors (no boundary, a cut-off body, a malformed part) on as plain Errors, which would be
 * answered as a 500; here they are the upload's fault. The form fields and the file name go through the
 * same checks as a JSON body (the input guard sees the request before multer has read them).
 */
export function singleFileUpload(limits: multer.Options['limits'], field = 'file'): RequestHandler {
  // Browsers send a file's name as raw UTF-8 in `filename="…"`; busboy reads such parameters as latin1 unless
  // told otherwise (multer passes the option on).
  const read = multer({ storage: multer.memoryStorage(), limits, defParamCharset: 'utf8' }).single(field);
  return (req, res, next) => {
    read(req, res, (err?: unknown) => {
      if (err instanceof MulterError) return next(err);
      if (err) {
        return next(
          new HttpError(400, 'bad_upload', 'The upload could not be read: it is cut off or not well-formed multipart/form-data. Choose the file and send it again.', [
            { field, messages: ['could not be read'] },
          ]),
        );
      }
      const problem = bodyProblem(req.body ?? null) ?? (req.file ? bodyProblem(req.file.originalname, `${field}.name`) : null);
      next(problem ? new ValidationFailed([problem]) : undefined);
    });
  };
}
