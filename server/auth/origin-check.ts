/**
 * CSRF defence: a state-changing request must come from our own origin (ASVS 5.0
 * 3.5.1-3.5.3; OWASP CSRF Prevention Cheat Sheet, "Verifying origin with standard
 * headers"). Origin is checked, Referer only when a browser sent no Origin; a request
 * with neither is refused. The SameSite=Lax cookie is defence in depth, not the defence.
 */
import type { RequestHandler } from 'express';
import { AppError } from '../http/app-error';
import { logger } from '../logger';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

function requestOrigin(origin: string | undefined, referer: string | undefined): string | null {
  if (origin && origin !== 'null') return origin;
  if (!referer) return null;
  try {
    return new URL(referer).origin;
  } catch {
    return null;
  }
}

export function requireSameOrigin(appOrigin: string): RequestHandler {
  const expected = new URL(appOrigin).origin;
  return (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const seen = requestOrigin(req.get('origin'), req.get('referer'));
    if (seen === expected) return next();
    logger.info(`Refused a cross-origin ${req.method} ${req.originalUrl} from ${seen ?? 'an unknown origin'}`);
    next(
      new AppError(
        'cross_origin',
        seen
          ? `Requests that change data must come from ${expected}; this one came from ${seen}.`
          : `Requests that change data must carry an Origin header matching ${expected}.`,
        403,
      ),
    );
  };
}
