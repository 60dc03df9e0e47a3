import type { RequestHandler, Response } from 'express';
import type { AppConfig } from '../config';
import { sessionStore, type SessionStore } from './session';

export function storeFor(config: AppConfig): SessionStore {
  return sessionStore({ secure: config.appOrigin.startsWith('https:') });
}

export function appendCookie(res: Response, cookie: string) {
  res.append('Set-Cookie', cookie);
}

/**
 * Resolves the session cookie into `req.user`. A cookie that no longer names a valid
 * session (expired, signed out, disabled account) is cleared in the browser.
 */
export function loadSession(config: AppConfig): RequestHandler {
  return async (req, res, next) => {
    const store = storeFor(config);
    const sessionId = store.readCookie(req.headers.cookie);
    if (!sessionId) return next();
    const valid = await store.validate(sessionId);
    if (!valid) {
      appendCookie(res, store.blankCookie());
      return next();
    }
    req.user = valid.user;
    req.sessionId = valid.sessionId;
    if (valid.refreshedCookie) appendCookie(res, valid.refreshedCookie);
    next();
  };
}
