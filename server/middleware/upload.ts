import type { NextFunction, Request, Response } from 'express';
import multer from 'multer';

import { HttpError } from '../errors';

/**
 * One file in the field `file`, kept in memory up to `maxBytes` (multer stops reading past the limit).
 * Multer's own errors become our 4xx answers, naming the field.
 */
export function singleFile(maxBytes: number) {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 64 * 1024 } }).single('file');
  return (req: Request, res: Response, next: NextFunction) => {
    handler(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file) return next(new HttpError(400, 'validation_failed', 'Attach a file.', [{ path: 'file', message: 'Choose a file to upload.' }]));
        return next();
      }
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'payload_too_large', `The file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB; nothing was saved.`, [{ path: 'file', message: `At most ${Math.round(maxBytes / 1024 / 1024)} MB.` }]));
        return next(new HttpError(400, 'validation_failed', `The upload could not be read (${err.code}).`, [{ path: err.field ?? 'file', message: err.message }]));
      }
      next(new HttpError(400, 'bad_request', 'The upload could not be read; send it as multipart/form-data with the file in the field "file".'));
    });
  };
}
