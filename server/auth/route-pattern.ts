/**
 * Route patterns as the access table and Express both write them (`/api/sites/:id`),
 * matched the way Express 5 matches by default: case-insensitive literals, one optional
 * trailing slash, a `:param` standing for one non-empty path segment.
 */
export interface RoutePattern {
  readonly method: string;
  readonly path: string;
  readonly segments: readonly string[];
  /** Literal segments win over params when two patterns match ("/users/me" over "/users/:id"). */
  readonly literalCount: number;
  /** The path with every param written `:`, to compare two patterns' shapes. */
  readonly shape: string;
}

const methods = new Set(['GET', 'POST', 'PUT', 'PATCH', 'DELETE']);

function splitPath(path: string): string[] {
  const trimmed = path.length > 1 && path.endsWith('/') ? path.slice(0, -1) : path;
  return trimmed.split('/').slice(1);
}

/** True for paths the access table can state: literal segments and whole-segment `:params`. */
export function isSimplePath(path: string): boolean {
  return /^(\/(:[A-Za-z_][A-Za-z0-9_]*|[A-Za-z0-9._~-]+))+\/?$/.test(path);
}

export function compilePattern(method: string, path: string): RoutePattern {
  const upper = method.toUpperCase();
  if (!methods.has(upper)) throw new Error(`Unsupported method "${method}" in route "${method} ${path}".`);
  if (!isSimplePath(path)) throw new Error(`Route path "${path}" must be literal segments and :params only.`);
  const segments = splitPath(path).map((s) => (s.startsWith(':') ? ':' : s.toLowerCase()));
  return {
    method: upper,
    path,
    segments,
    literalCount: segments.filter((s) => s !== ':').length,
    shape: `${upper} /${segments.join('/')}`,
  };
}

/** `'GET /api/sites/:id'` → its pattern; a malformed key throws at start-up. */
export function parseRouteKey(key: string): RoutePattern {
  const match = /^([A-Z]+) (\/\S*)$/.exec(key);
  if (!match) throw new Error(`Access table key "${key}" must look like "GET /api/path/:param".`);
  return compilePattern(match[1] ?? '', match[2] ?? '');
}

export function matchesPath(pattern: RoutePattern, path: string): boolean {
  const parts = splitPath(path);
  if (parts.length !== pattern.segments.length) return false;
  return pattern.segments.every((s, i) => {
    const part = parts[i] ?? '';
    return s === ':' ? part.length > 0 : s === part.toLowerCase();
  });
}

/** The most specific pattern for a request; HEAD is answered by GET routes, as in Express. */
export function findPattern<T extends RoutePattern>(patterns: readonly T[], method: string, path: string): T | null {
  const wanted = method === 'HEAD' ? 'GET' : method;
  let best: T | null = null;
  for (const p of patterns) {
    if (p.method !== wanted || !matchesPath(p, path)) continue;
    if (!best || p.literalCount > best.literalCount) best = p;
  }
  return best;
}
