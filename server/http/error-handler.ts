import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError } from './app-error';
import { logger } from '../logger';

/** Answers every error as `{error, issues?}`; unknown errors become a logged 500 without internals. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof AppError) {
    res.status(err.status).json({ error: err.message, ...(err.issues ? { issues: err.issues } : {}), ...err.extra });
    return;
  }
  if (err instanceof ZodError) {
    res.status(422).json({
      error: 'The request is invalid: see issues.',
      issues: err.issues.map((i) => ({ path: i.path.join('.'), message: i.message })),
    });
    return;
  }
  // Errors raised by body parsers and multer carry a status and a type.
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (err?.type === 'entity.parse.failed') {
    res.status(400).json({ error: 'The request body is not valid JSON.' });
    return;
  }
  if (err?.type === 'entity.too.large' || err?.code === 'LIMIT_FILE_SIZE' || status === 413) {
    res.status(413).json({ error: 'The request is too large.' });
    return;
  }
  if (status >= 400 && status < 500) {
    res.status(status).json({ error: typeof err?.message === 'string' ? err.message : 'Bad request.' });
    return;
  }
  logger.error(`Unhandled error on ${req.method} ${req.path}`, err);
  res.status(500).json({ error: 'Something went wrong on the server. The problem was logged.' });
};
