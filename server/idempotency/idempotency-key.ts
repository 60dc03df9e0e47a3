/**
 * `Idempotency-Key` on POST (IETF draft "The Idempotency-Key HTTP Header Field"): the
 * first request with a key runs and its successful answer is kept 24 hours per user,
 * key and route; a retry with the same key and the same body gets that answer again,
 * marked `Idempotent-Replayed: true`, and changes nothing. A key reused for another
 * body is refused (422), one whose first request is still running answers 409.
 * Failed requests keep nothing, so a corrected retry runs for real.
 */
import { createHash } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { getDb } from '../db/client';
import { AppError } from '../http/app-error';
import { logger } from '../logger';
import { canonicalJson } from '../sign-off/canonical-json';
import * as repo from './idempotency.repo';

export const IDEMPOTENCY_TTL_HOURS = 24;
/** A request "running" longer than this is taken to have died with its process. */
const STALE_SECONDS = 120;
const pruneEveryMs = 3600_000;
let lastPrune = 0;

const keyPattern = /^[\x21-\x7e]{1,255}$/;

/** The key, without the quotes of the draft's structured-field string form. */
function readKey(req: Request): string | undefined {
  const raw = req.get('idempotency-key')?.trim();
  if (raw === undefined) return undefined;
  const key = raw.length >= 2 && raw.startsWith('"') && raw.endsWith('"') ? raw.slice(1, -1) : raw;
  if (!keyPattern.test(key)) {
    throw new AppError(
      'invalid_idempotency_key',
      'The Idempotency-Key must be 1 to 255 visible ASCII characters, e.g. a UUID.',
      400,
    );
  }
  return key;
}

function fingerprint(req: Request): string {
  let body: string;
  try {
    body = canonicalJson(req.body ?? null);
  } catch {
    body = JSON.stringify(req.body ?? null);
  }
  const file = req.file ? createHash('sha256').update(req.file.buffer).digest('hex') : '';
  return createHash('sha256')
    .update(`${body}\n${file}\n${req.file?.originalname ?? ''}`)
    .digest('hex');
}

function replay(res: Response, row: NonNullable<Awaited<ReturnType<typeof repo.findKey>>>) {
  res.setHeader('Idempotent-Replayed', 'true');
  if (row.responseLocation) res.setHeader('Location', row.responseLocation);
  res.status(row.responseStatus ?? 200);
  if (row.responseBody === null) res.end();
  else res.json(row.responseBody);
}

/** Keeps the answer when it is a success, gives the key back otherwise. */
function rememberAnswer(res: Response, id: repo.IdempotencyId) {
  let body: unknown = null;
  const json = res.json.bind(res);
  res.json = (value: unknown) => {
    body = value;
    return json(value);
  };
  let settled = false;
  const settle = (finished: boolean) => {
    if (settled) return;
    settled = true;
    const ok = finished && res.statusCode >= 200 && res.statusCode < 300;
    const location = res.getHeader('Location');
    const work = ok
      ? repo.storeAnswer(getDb(), id, { status: res.statusCode, body, location: typeof location === 'string' ? location : null })
      : repo.releaseKey(getDb(), id);
    work.catch((error: unknown) => logger.error('Could not store or release an Idempotency-Key', error));
  };
  res.on('finish', () => settle(true));
  res.on('close', () => settle(res.writableFinished));
}

/**
 * `forUploads`: mounted on an upload route after the file is read, so the fingerprint
 * covers the file; the API-wide instance leaves multipart requests to it.
 */
export function honourIdempotencyKey(options: { forUploads?: boolean } = {}): RequestHandler {
  return async (req, res, next) => {
    if (req.method !== 'POST' || !req.user) return next();
    if (!options.forUploads && req.is('multipart/form-data')) return next();
    const key = readKey(req);
    if (key === undefined) return next();
    const id = { userId: req.user.id, key, route: `POST ${req.baseUrl}${req.path}` };
    const print = fingerprint(req);
    const db = getDb();
    if (Date.now() - lastPrune > pruneEveryMs) {
      lastPrune = Date.now();
      repo.pruneExpiredKeys(db).catch((error: unknown) => logger.error('Could not prune old Idempotency-Keys', error));
    }
    if (await repo.claimKey(db, id, print, IDEMPOTENCY_TTL_HOURS, STALE_SECONDS)) {
      rememberAnswer(res, id);
      return next();
    }
    const row = await repo.findKey(db, id);
    if (!row)
      return next(new AppError('idempotency_conflict', 'The Idempotency-Key was just released: send the request again.', 409));
    if (row.fingerprint !== print) {
      return next(
        new AppError(
          'idempotency_key_reused',
          'This Idempotency-Key was already used for a different request to this route: use a new key for a new request.',
          422,
        ),
      );
    }
    if (row.state === 'in_flight') {
      res.setHeader('Retry-After', '1');
      return next(
        new AppError('idempotency_conflict', 'A request with this Idempotency-Key is still running: retry in a moment.', 409),
      );
    }
    replay(res, row);
  };
}
