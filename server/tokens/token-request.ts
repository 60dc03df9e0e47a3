/** The API token behind a request, set by the token middleware (server/tokens/token-auth.ts). */
import type { Request, RequestHandler } from 'express';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express types are augmented through this namespace
  namespace Express {
    interface Request {
      /** Id and name of the API token the request came with; absent for browser sessions. Never the secret. */
      apiToken?: { id: string; name: string };
    }
  }
}

export const cameWithToken = (req: Request): boolean => req.apiToken !== undefined;

/**
 * Runs `handler` only for requests without an API token. A token request is
 * authenticated by its token alone: no cookie is read, so the Origin check that
 * protects cookies from cross-site use has nothing to protect there.
 */
export function unlessToken(handler: RequestHandler): RequestHandler {
  return (req, res, next) => (cameWithToken(req) ? next() : handler(req, res, next));
}
