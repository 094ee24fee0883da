import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '@server/lib/http-error';

const megabytes = (bytes: number) => `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB`;

/**
 * One uploaded file in the multipart field `field`, kept in memory (uploads here are small and
 * checked before anything is stored), plus a few short text fields. Multer's own errors become
 * 400/413 answers naming the field.
 */
export function singleUpload(field: string, options: { maxBytes: number; what: string }): RequestHandler {
  const handler = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: options.maxBytes, files: 1, fields: 8, fieldSize: 2000, parts: 10 },
  }).single(field);
  return (req, res, next) => {
    handler(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') {
          const message = `The ${options.what} is larger than ${megabytes(options.maxBytes)}`;
          return next(new HttpError(413, message, { fields: { [field]: message } }));
        }
        if (error.code === 'LIMIT_UNEXPECTED_FILE') {
          const message = `Send one ${options.what} in the form field "${field}"`;
          return next(new HttpError(400, message, { fields: { [field]: message } }));
        }
        return next(new HttpError(400, `The upload could not be read: ${error.message}`));
      }
      // Anything else from the multipart reader is a body it could not parse (a missing
      // boundary, a cut-off part): the sender's mistake, not the server's.
      const reason = error instanceof Error ? error.message : 'malformed multipart body';
      next(new HttpError(400, `The upload could not be read: ${reason}`, { code: 'bad_upload' }));
    });
  };
}

/** The uploaded file, or a 400 naming the field when none came. */
export function uploadedFile(req: Request, field: string, what: string): Express.Multer.File {
  if (!req.file) {
    const message = `Choose a ${what} to upload`;
    throw new HttpError(400, message, { fields: { [field]: message } });
  }
  return req.file;
}
