/**
 * Receives `POST /api/sites/:id/profiles` as multipart/form-data: one file in
 * `file` held in memory (at most 20 MB, 413 past it) and a few short text
 * fields. multer and busboy errors become answers that say what to change,
 * instead of a 500 (ASVS 5.0 5.2.1: size limit; OWASP File Upload cheat sheet).
 */
import type { RequestHandler } from 'express';
import multer from 'multer';
import { MAX_PROFILE_UPLOAD_BYTES } from '@shared/schemas/profile';
import { AppError } from '../http/app-error';

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PROFILE_UPLOAD_BYTES, files: 1, fields: 10, fieldSize: 1024, fieldNameSize: 100, parts: 12 },
}).single('file');

const megabytes = MAX_PROFILE_UPLOAD_BYTES / (1024 * 1024);
const rejected = (message: string, status = 422) =>
  new AppError('invalid_upload', message, status, [{ line: 0, message }], {
    hint: 'Nothing was stored. Send the form with one CSV file in the field "file" and the fields kind and unit.',
  });

function translate(error: unknown): AppError {
  if (error instanceof multer.MulterError) {
    switch (error.code) {
      case 'LIMIT_FILE_SIZE':
        return new AppError(
          'too_large',
          `The file is larger than ${megabytes} MB, the most an upload may hold.`,
          413,
          undefined,
          {
            hint: `Nothing was stored. Split the data into files under ${megabytes} MB (a year of 5-minute rows takes about 3 MB).`,
          },
        );
      case 'LIMIT_UNEXPECTED_FILE':
      case 'LIMIT_FILE_COUNT':
        return rejected(`Send exactly one file, in the form field "file" (got a file in "${error.field ?? '?'}").`);
      default:
        return rejected(
          `The upload form was refused: ${error.message}. Send only the fields file, kind, unit, name, intervalEnding, fillGaps, dateOrder and decimalSeparator.`,
        );
    }
  }
  // busboy's own errors (malformed multipart body, request cut off) carry no status.
  return rejected('The upload could not be read as a multipart form (was it cut off?). Send it again.', 400);
}

export const receiveProfileUpload: RequestHandler = (req, res, next) => {
  upload(req, res, (error?: unknown) => next(error == null ? undefined : translate(error)));
};
