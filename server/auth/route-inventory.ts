/**
 * Lists the routes actually registered in an Express 5 router tree, so the access
 * check can tell "a real route that is missing from the access table" (refused, and a
 * failing test) from "no such route" (404). Walks `router.stack` of the `router` package.
 */
import type { Router } from 'express';
import { isSimplePath } from './route-pattern';

export interface RegisteredRoute {
  method: string;
  /** Full path from the given prefix, e.g. `/api/sites/:id`. */
  path: string;
  /** False for regex, wildcard or optional-segment paths the access table cannot express. */
  simple: boolean;
}

interface LayerLike {
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: LayerLike[] };
  rawPath?: unknown;
}

function joinPaths(prefix: string, path: string): string {
  if (path === '/' || path === '') return prefix || '/';
  return `${prefix}${path}`;
}

function pathsOf(raw: unknown): string[] {
  if (typeof raw === 'string') return [raw];
  if (Array.isArray(raw)) return raw.flat(Infinity).map((p) => (typeof p === 'string' ? p : String(p)));
  return [String(raw)];
}

export function listRoutes(router: Router | { stack?: unknown }, prefix = ''): RegisteredRoute[] {
  const found: RegisteredRoute[] = [];
  const stack = (router as { stack?: LayerLike[] }).stack ?? [];
  for (const layer of stack) {
    if (layer.route) {
      const methods = Object.keys(layer.route.methods).filter((m) => m !== '_all' && layer.route?.methods[m]);
      // `router.all()` registers every method: list it as such so the table must name it.
      if (layer.route.methods._all) methods.push('all');
      for (const p of pathsOf(layer.route.path)) {
        const path = joinPaths(prefix, p);
        for (const m of methods) found.push({ method: m.toUpperCase(), path, simple: m !== 'all' && isSimplePath(path) });
      }
    } else if (layer.handle?.stack) {
      for (const mount of pathsOf(layer.rawPath ?? '/')) {
        found.push(...listRoutes(layer.handle, mount === '/' ? prefix : `${prefix}${mount}`));
      }
    }
  }
  return found;
}
