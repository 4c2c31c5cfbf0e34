import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import type { Config } from '../config';
import { HttpError } from '../errors';

/** One CSV file in the multipart field `file`, kept in memory up to the size cap. */
export function singleFileUpload(config: Config): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: config.upload.maxBytes, files: 1, fields: 4, fieldSize: 1024 * 1024 },
  }).single('file');
  const mb = (config.upload.maxBytes / (1024 * 1024)).toFixed(0);
  return (req: Request, res: Response, next: NextFunction) => {
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          return next(new HttpError(413, 'FILE_TOO_LARGE', `This file is larger than ${mb} MB, the most one import takes. Split the session and import the parts.`));
        }
        return next(new HttpError(400, 'BAD_UPLOAD', `The upload could not be read (${err.code}). Send one file in the field "file".`));
      }
      // Anything else the multipart parser reports is the request's fault: a body cut off before
      // its end ("Unexpected end of form"), a missing boundary, a malformed part header.
      if (err) return next(new HttpError(400, 'BAD_UPLOAD', 'The upload arrived incomplete or malformed. Send the file again.'));
      if (!req.file) return next(new HttpError(400, 'NO_FILE', 'Choose a bay file (CSV) to import.'));
      next();
    });
  };
}

/** The JSON `options` field of a multipart request, or {}. */
export function jsonField(req: Request, name: string): unknown {
  const raw = (req.body as Record<string, unknown> | undefined)?.[name];
  if (raw === undefined || raw === '') return {};
  if (typeof raw !== 'string') throw new HttpError(400, 'VALIDATION_FAILED', `The field "${name}" must be JSON text.`);
  try {
    return JSON.parse(raw);
  } catch {
    throw new HttpError(400, 'VALIDATION_FAILED', `The field "${name}" is not valid JSON.`);
  }
}
