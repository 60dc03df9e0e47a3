/**
 * Routes a token may not call, though its role may: making credentials needs a person
 * at a signed-in browser. A leaked token therefore cannot mint fresh tokens that
 * outlive it, nor change its owner's password.
 */
import type { RequestHandler } from 'express';
import type { AccessKey } from '../auth/access-table';
import { parseRouteKey, findPattern } from '../auth/route-pattern';
import { AppError } from '../http/app-error';
import { cameWithToken } from './token-request';

export const sessionOnlyRoutes = [
  'POST /api/tokens',
  'POST /api/service-users',
  'POST /api/service-users/:id/tokens',
  'POST /api/auth/password',
] as const satisfies readonly AccessKey[];

const patterns = sessionOnlyRoutes.map(parseRouteKey);

export const refuseTokenOnSessionOnlyRoutes: RequestHandler = (req, _res, next) => {
  if (!cameWithToken(req) || !findPattern(patterns, req.method, `${req.baseUrl}${req.path}`)) return next();
  next(
    new AppError(
      'session_required',
      'This needs a signed-in browser session: API tokens cannot create tokens or service users, or change a password.',
      403,
    ),
  );
};
