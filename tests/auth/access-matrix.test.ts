/**
 * The access-control matrix, generated from server/auth/access-table.ts (SECURITY.md test 1;
 * ASVS 5.0 8.2.1-8.3.1): anonymous and each role against every route in the table, with the
 * status the role table implies. A new line in the table is covered automatically, and a
 * route registered in Express without a line in the table fails this file.
 *
 * How "registered" is known: the test walks the Express router stack of the real app
 * (server/auth/route-inventory.ts), the same list the access middleware uses at run time
 * to refuse unlisted routes.
 *
 * Each role is also tried with an API token of its own (`Authorization: Bearer`, no cookie, no
 * Origin header): a token has its user's role, except on the routes that need a browser
 * session (server/tokens/session-only-routes.ts), which refuse every token with 403.
 *
 * Handlers not written yet answer 404 "No API route" from the API fallback. That is accepted
 * for an allowed role only while the route is absent from the router stack; the list of such
 * routes is printed, so colleagues' routes are checked for real as soon as they land.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { roles, type Role } from '@shared/schemas/auth';
import { compileAccessTable } from '../../server/auth/access-control';
import { listRoutes } from '../../server/auth/route-inventory';
import { compilePattern } from '../../server/auth/route-pattern';
import { sessionOnlyRoutes } from '../../server/tokens/session-only-routes';
import { createTestApp } from '../support/test-app';
import { anonymousAgent, createUser, signInAs, type SignedInAgent, type TestUser } from '../support/auth';
import { createToken } from '../support/tokens';

const app = createTestApp();
const rules = compileAccessTable();
const registered = listRoutes(app.router, '').filter((r) => r.path === '/api' || r.path.startsWith('/api/'));
const registeredShapes = new Set(registered.filter((r) => r.simple).map((r) => compilePattern(r.method, r.path).shape));

/** A well-formed id that names nothing, so allowed callers reach the handler and get 404/422, never a change. */
const placeholderId = '00000000-0000-4000-8000-000000000000';
const concrete = (path: string) => path.replace(/:[A-Za-z_][A-Za-z0-9_]*/g, placeholderId);

const users = {} as Record<Role, TestUser>;
const agents = {} as Record<Role, SignedInAgent>;
const tokens = {} as Record<Role, string>;
const missingHandlers = new Set<string>();

beforeAll(async () => {
  for (const role of roles) {
    users[role] = await createUser(role);
    agents[role] = await signInAs(app, users[role]);
    tokens[role] = (await createToken(agents[role], `matrix ${role}`)).token;
  }
});

afterAll(() => {
  if (missingHandlers.size > 0) {
    console.info(
      `Access table lines whose handler is not written yet (allowed roles got the API's 404):\n  ${[...missingHandlers].sort().join('\n  ')}`,
    );
  }
});

/** The role's agent, signed in again if a previous route (sign-out) ended its session. */
async function agentFor(role: Role): Promise<SignedInAgent> {
  const current = agents[role];
  if ((await current.get('/api/auth/me')).status === 200) return current;
  agents[role] = await signInAs(app, users[role]);
  return agents[role];
}

function send(agent: ReturnType<typeof anonymousAgent>, method: string, path: string) {
  const url = concrete(path);
  switch (method) {
    case 'GET':
      return agent.get(url);
    case 'POST':
      return agent.post(url).send({});
    case 'PATCH':
      return agent.patch(url).send({});
    case 'PUT':
      return agent.put(url).send({});
    case 'DELETE':
      return agent.delete(url);
    default:
      throw new Error(`No matrix request for method ${method}`);
  }
}

/** The same request with only the role's API token: no cookie jar, no Origin header. */
function sendWithToken(role: Role, method: string, path: string) {
  const url = concrete(path);
  const withToken = <T extends { set(field: string, value: string): T }>(test: T) =>
    test.set('Authorization', `Bearer ${tokens[role]}`);
  switch (method) {
    case 'GET':
      return withToken(request(app).get(url));
    case 'POST':
      return withToken(request(app).post(url)).send({});
    case 'PATCH':
      return withToken(request(app).patch(url)).send({});
    case 'PUT':
      return withToken(request(app).put(url)).send({});
    case 'DELETE':
      return withToken(request(app).delete(url));
    default:
      throw new Error(`No matrix request for method ${method}`);
  }
}

const sessionOnly = new Set<string>(sessionOnlyRoutes);

function expectAllowed(rule: (typeof rules)[number], who: string, status: number, body: { error?: unknown }) {
  const handlerMissing = status === 404 && typeof body.error === 'string' && body.error.startsWith('No API route');
  if (handlerMissing) {
    expect(registeredShapes.has(rule.shape), `${rule.key} is registered but answered "No API route"`).toBe(false);
    missingHandlers.add(rule.key);
    return;
  }
  expect([401, 403], `${who} must be let through ${rule.key} (got ${status} ${JSON.stringify(body)})`).not.toContain(status);
  // Allowed callers with an empty body and an id that names nothing get a clear 4xx, never a crash.
  expect(status, `${who} on ${rule.key} crashed the handler: ${JSON.stringify(body)}`).toBeLessThan(500);
}

describe('every API route registered in Express', () => {
  it('has its own line in the access table (deny by default)', () => {
    const tableShapes = new Set(rules.map((r) => r.shape));
    const unlisted = registered.filter((r) => !r.simple || !tableShapes.has(compilePattern(r.method, r.path).shape));
    expect(unlisted.map((r) => `${r.method} ${r.path}`)).toEqual([]);
    expect(registered.length).toBeGreaterThan(5);
  });
});

describe('the access table', () => {
  it('has no two lines for the same method and path shape', () => {
    const shapes = rules.map((r) => r.shape);
    expect(shapes.filter((s, i) => shapes.indexOf(s) !== i)).toEqual([]);
  });

  it('allows each protected route to at least one known role', () => {
    for (const rule of rules) {
      if (rule.access === 'public') continue;
      expect(rule.access.length, rule.key).toBeGreaterThan(0);
      for (const role of rule.access) expect(roles, rule.key).toContain(role);
    }
  });
});

describe.each(rules.map((rule) => [rule.key, rule] as const))('%s', (_key, rule) => {
  it(rule.access === 'public' ? 'is open to anonymous callers' : 'answers 401 to anonymous callers', async () => {
    const response = await send(anonymousAgent(app), rule.method, rule.path);
    if (rule.access === 'public') expectAllowed(rule, 'anonymous', response.status, response.body);
    else expect(response.status, JSON.stringify(response.body)).toBe(401);
  });

  it.each(roles.map((role) => [role]))('answers %s as the role table says', async (role) => {
    const allowed = rule.access === 'public' || rule.access.includes(role);
    const response = await send(await agentFor(role), rule.method, rule.path);
    if (allowed) expectAllowed(rule, role, response.status, response.body);
    else expect(response.status, JSON.stringify(response.body)).toBe(403);
  });
});

describe.each(rules.map((rule) => [rule.key, rule] as const))('%s with an API token', (_key, rule) => {
  it.each(roles.map((role) => [role]))("answers a %s's token as DESIGN section 5 says", async (role) => {
    const allowed = rule.access === 'public' || rule.access.includes(role);
    const response = await sendWithToken(role, rule.method, rule.path);
    if (allowed && sessionOnly.has(rule.key)) {
      expect(response.status, JSON.stringify(response.body)).toBe(403);
      expect(response.body.error).toMatch(/signed-in browser session/);
    } else if (allowed) expectAllowed(rule, `${role} token`, response.status, response.body);
    else expect(response.status, JSON.stringify(response.body)).toBe(403);
  });
});

describe('requests that only look different', () => {
  it('are matched like Express matches them: case, trailing slash and HEAD do not get past the table', async () => {
    const viewer = await agentFor('viewer');
    expect((await viewer.get('/api/USERS')).status).toBe(403);
    expect((await viewer.get('/api/users/')).status).toBe(403);
    expect((await viewer.head('/api/audit')).status).toBe(403);
    expect((await request(app).get('/api/Audit/')).status).toBe(401);
  });
});
