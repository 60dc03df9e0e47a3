/**
 * Deny by default (ASVS 5.0 8.2.1; OWASP Authorization Cheat Sheet "deny by default"):
 * a handler that exists but has no line in the access table is never reached.
 */
import { describe, expect, it } from 'vitest';
import express from 'express';
import request from 'supertest';
import { and, desc, eq } from 'drizzle-orm';
import { getDb } from '../../server/db/client';
import { auditEvents } from '../../server/audit/audit.schema';
import { accessControl } from '../../server/auth/access-control';
import { listRoutes } from '../../server/auth/route-inventory';
import { errorHandler } from '../../server/http/error-handler';
import { createTestApp } from '../support/test-app';
import { createUser } from '../support/auth';

createTestApp(); // initialises the test database for the audit rows

/** A tiny app with the real access middleware; `x-test-role` stands in for a session. */
function appWithUnlistedRoute(userId: string, email: string) {
  const api = express.Router();
  api.use((req, _res, next) => {
    const role = req.get('x-test-role');
    if (role) req.user = { id: userId, email, name: 'Test', role: role as 'admin' };
    next();
  });
  api.use(accessControl(() => listRoutes(api, '/api')));
  let reached = 0;
  const feature = express.Router();
  feature.get('/secret-report', (_req, res) => {
    reached += 1;
    res.json({ secret: true });
  });
  feature.get('/health', (_req, res) => res.json({ ok: true }));
  api.use(feature);
  api.use((req, _res, next) => next(Object.assign(new Error(`No API route ${req.method} ${req.path}.`), { status: 404 })));
  const app = express();
  app.use('/api', api);
  app.use(errorHandler);
  return { app, reached: () => reached };
}

describe('a route registered in Express but missing from the access table', () => {
  it('is refused to anonymous callers with 401 and to every role, admin included, with 403', async () => {
    const admin = await createUser('admin');
    const { app, reached } = appWithUnlistedRoute(admin.id, admin.email);
    expect((await request(app).get('/api/secret-report')).status).toBe(401);
    const asAdmin = await request(app).get('/api/secret-report').set('x-test-role', 'admin');
    expect(asAdmin.status).toBe(403);
    expect(asAdmin.body.secret).toBeUndefined();
    expect(reached()).toBe(0);
    // ASVS 5.0 16.3.2: refused authorisations are logged.
    const [audit] = await getDb()
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.action, 'access.denied'), eq(auditEvents.actorId, admin.id)))
      .orderBy(desc(auditEvents.id))
      .limit(1);
    expect(audit?.details).toMatchObject({
      method: 'GET',
      path: '/api/secret-report',
      reason: 'route missing from the access table',
    });
  });

  it('does not hide routes that are listed, and answers 404 where nothing is served', async () => {
    const { app } = appWithUnlistedRoute('x', 'x@test.slackwater.example');
    expect((await request(app).get('/api/health')).status).toBe(200);
    expect((await request(app).get('/api/no-such-thing')).status).toBe(404);
  });
});
