/**
 * Receiving one file (multipart/form-data, field `file`) into memory with multer, within the
 * configured size; multer's errors become HttpErrors (413 too large, 422 wrong fields).
 */
import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../http/http-error';

function toHttpError(err: unknown, limitBytes: number): unknown {
  if (!(err instanceof multer.MulterError)) return err;
  if (err.code === 'LIMIT_FILE_SIZE') {
    return new HttpError(413, 'file-too-large', `The file is larger than ${Math.round(limitBytes / 1024 / 1024 * 10) / 10} MB.`);
  }
  return new HttpError(422, 'invalid-upload', `Send one file in the form field "file" (${err.message}).`, [{ path: err.field ?? 'file', message: err.message }]);
}

/** Middleware: req.file (Buffer in memory) and req.body's text fields. */
export function receiveFile(limitBytes: number): RequestHandler {
  const single = multer({ storage: multer.memoryStorage(), limits: { fileSize: limitBytes, files: 1, fields: 8, fieldSize: 1024 } }).single('file');
  return (req, res, next) => single(req, res, (err?: unknown) => next(err ? toHttpError(err, limitBytes) : undefined));
}
