import multer from 'multer';

/**
 * A multipart parser that keeps one file in memory. Browsers send a file's name as raw UTF-8 in
 * `filename="…"`; busboy reads such parameters as latin1 unless told otherwise (multer passes the option on).
 */
export function memoryUpload(maxBytes: number) {
  return multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 10 }, defParamCharset: 'utf8' });
}
