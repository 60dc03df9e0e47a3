/** The signed-in user on a request, set by the session middleware. */
import type { Request } from 'express';
import type { AuthUser } from '@shared/schemas/auth';
import { AppError } from '../http/app-error';
import type { AppConfig } from '../config';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express types are augmented through this namespace
  namespace Express {
    interface Request {
      /** `{id, email, name, role}` of the signed-in user; absent for anonymous requests. */
      user?: AuthUser;
      /** The lucia session id behind `user`; never log it. */
      sessionId?: string;
    }
  }
}

export const notSignedIn = () => new AppError('unauthenticated', 'Sign in to continue.', 401);

/** The signed-in user, for handlers behind a protected route (the access table guarantees one). */
export function requireUser(req: Request): AuthUser {
  if (!req.user) throw notSignedIn();
  return req.user;
}

export function appConfig(req: Request): AppConfig {
  return req.app.locals.config as AppConfig;
}

/** The client address as Express resolved it (trust proxy: loopback only). */
export function clientIp(req: Request): string {
  return req.ip ?? req.socket.remoteAddress ?? 'unknown';
}
