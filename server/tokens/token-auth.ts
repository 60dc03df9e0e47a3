/**
 * Requests with `Authorization: Bearer <token>` (RFC 6750 section 2.1). The token
 * alone authenticates them: the session cookie is not read and the Origin check is
 * skipped (server/tokens/token-request.ts). A token that is malformed, unknown,
 * expired or revoked gets one and the same 401; a token in the URL is refused
 * (RFC 6750 section 5.3: URLs end up in logs and histories). Each token has its own
 * rate limit, and failed tokens are limited per client address.
 */
import type { Request, RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { AppConfig } from '../config';
import { getDb } from '../db/client';
import { AppError } from '../http/app-error';
import { logger } from '../logger';
import { recordAudit } from '../audit/audit.service';
import { runWithAuditVia } from '../audit/audit-via';
import { clientIp } from '../auth/current-user';
import { checkToken, type TokenCheck } from './tokens.service';
import { TOKEN_IN_TEXT } from './token-secret';
import './token-request';

/** The one answer for every unusable token, so an answer never tells which tokens exist. */
export const invalidToken = () =>
  new AppError(
    'invalid_token',
    'The API token is not valid: it is mistyped, expired or revoked. Create a new one under Settings → API tokens.',
    401,
  );

const urlTokenNames = new Set(['access_token', 'token', 'api_token', 'apitoken', 'api_key', 'apikey', 'bearer', 'authorization']);

function tokenInUrl(req: Request): boolean {
  if (TOKEN_IN_TEXT.test(req.originalUrl)) return true;
  return Object.keys(req.query).some((name) => urlTokenNames.has(name.toLowerCase()));
}

/** Refuses API tokens in the query string before anything else reads or logs the URL. */
export const refuseTokenInUrl: RequestHandler = (req, _res, next) => {
  if (!tokenInUrl(req)) return next();
  logger.info(`Refused a ${req.method} request that carried an API token in its URL, from ${clientIp(req)}`);
  next(
    new AppError(
      'token_in_url',
      'Send the API token in the Authorization header (Authorization: Bearer <token>), never in the URL: URLs are kept in logs and histories. If the token was real, revoke it under Settings → API tokens and create a new one.',
      400,
    ),
  );
};

async function recordRefusal(req: Request, check: Extract<TokenCheck, { ok: false }>) {
  logger.info(`Refused an API token (${check.reason}) on ${req.method} ${req.path} from ${clientIp(req)}`);
  if (!check.tokenId) return;
  try {
    await recordAudit(getDb(), req, {
      action: 'auth.token_refused',
      entityType: 'api_token',
      entityId: check.tokenId,
      details: { reason: check.reason },
    });
  } catch (error) {
    logger.error('Could not record a refused API token in the audit trail', error);
  }
}

const rateLimited = (message: string) => new AppError('rate_limited', message, 429);

export function tokenAuthentication(config: AppConfig): RequestHandler[] {
  const failuresPerAddress = rateLimit({
    windowMs: 15 * 60_000,
    limit: config.API_TOKEN_FAILURES_PER_ADDRESS,
    skip: (req) => req.get('authorization') === undefined,
    skipSuccessfulRequests: true,
    requestWasSuccessful: (_req, res) => res.statusCode !== 401,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(rateLimited('Too many requests with an invalid API token from this address; wait 15 minutes and check the token.')),
  });
  const perToken = rateLimit({
    windowMs: 60_000,
    limit: config.API_TOKEN_REQUESTS_PER_MINUTE,
    skip: (req) => req.apiToken === undefined,
    keyGenerator: (req) => `token:${req.apiToken?.id ?? ''}`,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res, next) =>
      next(
        rateLimited(
          `This token made more than ${config.API_TOKEN_REQUESTS_PER_MINUTE} requests in a minute; wait ${String(res.getHeader('Retry-After') ?? 60)} s.`,
        ),
      ),
  });
  const authenticate: RequestHandler = async (req, res, next) => {
    const header = req.get('authorization');
    if (header === undefined) return next();
    const presented = /^Bearer +(\S+) *$/i.exec(header)?.[1];
    const check: TokenCheck = presented ? await checkToken(presented, clientIp(req)) : { ok: false, reason: 'malformed' };
    if (!check.ok) {
      await recordRefusal(req, check);
      res.setHeader('WWW-Authenticate', 'Bearer realm="Slackwater API", error="invalid_token"');
      return next(invalidToken());
    }
    req.user = check.user;
    req.apiToken = check.token;
    await runWithAuditVia({ label: `token ${check.token.name}`, tokenId: check.token.id }, () => perToken(req, res, next));
  };
  return [refuseTokenInUrl, failuresPerAddress, authenticate];
}
