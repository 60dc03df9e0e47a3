/**
 * The one gate in front of every API handler (ASVS 5.0 8.2.1-8.3.1): a request is
 * matched to its line in the access table and refused unless the line allows the
 * caller. A route registered in Express but missing from the table is refused too
 * (deny by default); a path nothing serves is a plain 404.
 */
import type { RequestHandler } from 'express';
import { getDb } from '../db/client';
import { AppError } from '../http/app-error';
import { logger } from '../logger';
import { recordAudit } from '../audit/audit.service';
import { requestAuthor } from '../http/request-context';
import { accessTable, type Access } from './access-table';
import { compilePattern, findPattern, parseRouteKey, type RoutePattern } from './route-pattern';
import type { RegisteredRoute } from './route-inventory';
import { notSignedIn } from './current-user';

export interface AccessRule extends RoutePattern {
  readonly key: string;
  readonly access: Access;
}

export function compileAccessTable(table: Record<string, Access> = accessTable): AccessRule[] {
  return Object.entries(table).map(([key, access]) => ({ ...parseRouteKey(key), key, access }));
}

/** Registered routes as patterns (routes the table cannot express still count as "served"). */
function servedPatterns(routes: readonly RegisteredRoute[]): RoutePattern[] {
  return routes.filter((r) => r.simple).map((r) => compilePattern(r.method, r.path));
}

const noRoute = (method: string, path: string) => new AppError('not_found', `No API route ${method} ${path}.`, 404);

export function accessControl(registeredRoutes: () => readonly RegisteredRoute[]): RequestHandler {
  const rules = compileAccessTable();
  let served: RoutePattern[] | null = null;
  return async (req, _res, next) => {
    const path = `${req.baseUrl}${req.path}`;
    const rule = findPattern(rules, req.method, path);
    if (!rule) {
      served ??= servedPatterns(registeredRoutes());
      const unlisted = findPattern(served, req.method, path);
      if (!unlisted) return next(noRoute(req.method, req.path));
      logger.error(`Refused ${req.method} ${path}: the route is registered but missing from server/auth/access-table.ts`);
      if (!req.user) return next(notSignedIn());
      await auditRefusal(req, path, 'route missing from the access table');
      return next(new AppError('forbidden', 'This route is not open to any role yet.', 403));
    }
    if (rule.access === 'public') return next();
    if (!req.user) return next(notSignedIn());
    if (rule.access.includes(req.user.role)) return next();
    logger.info(`Refused ${req.method} ${path} for role ${req.user.role}`);
    await auditRefusal(req, path, `role ${req.user.role} is not allowed`);
    next(new AppError('forbidden', `Your role (${req.user.role}) does not allow this.`, 403));
  };
}

async function auditRefusal(req: Parameters<RequestHandler>[0], path: string, reason: string) {
  try {
    await recordAudit(getDb(), requestAuthor(req), {
      action: 'access.denied',
      details: { method: req.method, path: path.slice(0, 300), reason },
    });
  } catch (error) {
    logger.error('Could not record a refused request in the audit trail', error);
  }
}
