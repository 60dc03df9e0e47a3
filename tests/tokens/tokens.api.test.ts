/**
 * API tokens: creation shows the secret once, the database keeps only its SHA-256,
 * lifetimes default to 90 days and stop at one year, and revocation ends a token.
 * Bearer tokens as in RFC 6750 section 2.1; storage of a hash only as for the one-time
 * links (OWASP Authentication and Session Management cheat sheets: store secrets hashed).
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { getPool } from '../../server/db/client';
import { createTestApp } from '../support/test-app';
import { signInAs } from '../support/auth';
import { bearer, createToken, secretOf } from '../support/tokens';
import { expectMatchesOpenApi } from '../support/openapi-check';

const app = createTestApp();
const dayMs = 86_400_000;

async function storedRow(id: string) {
  const result = await getPool().query('select * from api_tokens where id = $1', [id]);
  return result.rows[0] as Record<string, unknown>;
}

describe('POST /api/tokens', () => {
  it('answers 201 with {id, name, token, expiresAt} and a 90-day default lifetime', async () => {
    const planner = await signInAs(app, 'planner');
    const before = Date.now();
    const response = await planner.post('/api/tokens').send({ name: 'nightly forecast push' });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    expectMatchesOpenApi(response);
    expect(Object.keys(response.body).sort()).toEqual(['expiresAt', 'id', 'name', 'token']);
    expect(response.body.name).toBe('nightly forecast push');
    // 32 hex digits of the id, then 43 base64url characters = 258 bits, of which 256 are random [D].
    expect(response.body.token).toMatch(/^swt_[0-9a-f]{32}_[A-Za-z0-9_-]{43}$/);
    expect(response.body.token).toContain(response.body.id.replaceAll('-', ''));
    const lifetime = Date.parse(response.body.expiresAt) - before;
    expect(lifetime).toBeGreaterThan(90 * dayMs - 60_000);
    expect(lifetime).toBeLessThan(90 * dayMs + 60_000);
  });

  it('stores only the SHA-256 of the secret, never the token itself', async () => {
    const planner = await signInAs(app, 'planner');
    const created = await createToken(planner, 'hash check');
    const secret = secretOf(created.token);
    expect(secret).toHaveLength(43);
    expect(Buffer.from(secret, 'base64url')).toHaveLength(32); // 256 bits [D]: 43 base64url chars decode to 32 bytes
    const row = await storedRow(created.id);
    // [S] FIPS 180-4 SHA-256 via Node's crypto, computed here independently of the server.
    expect(row.secret_sha256).toBe(createHash('sha256').update(secret).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(secret);
  });

  it('takes expiresInDays from 1 to 365 and refuses anything else with 422', async () => {
    const planner = await signInAs(app, 'planner');
    const year = await planner.post('/api/tokens').send({ name: 'a year', expiresInDays: 365 });
    expect(year.status).toBe(201);
    expect(Math.round((Date.parse(year.body.expiresAt) - Date.now()) / dayMs)).toBe(365);
    for (const bad of [0, 366, 1.5, '30', -1]) {
      const response = await planner.post('/api/tokens').send({ name: `bad ${String(bad)}`, expiresInDays: bad });
      expect(response.status, String(bad)).toBe(422);
      expect(response.body.issues[0].path).toBe('expiresInDays');
    }
    const noName = await planner.post('/api/tokens').send({ name: '  ' });
    expect(noName.status).toBe(422);
    const lineBreak = await planner.post('/api/tokens').send({ name: 'evil\nname' });
    expect(lineBreak.status).toBe(422);
    const extra = await planner.post('/api/tokens').send({ name: 'x', userId: planner.user.id });
    expect(extra.status).toBe(422);
  });

  it('refuses a second valid token with the same name (409), so the audit trail can tell them apart', async () => {
    const planner = await signInAs(app, 'planner');
    await createToken(planner, 'Deploy');
    const again = await planner.post('/api/tokens').send({ name: 'deploy' });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatch(/already exists/);
  });
});

describe('GET /api/tokens', () => {
  it("lists the caller's tokens with their use, never the secret", async () => {
    const planner = await signInAs(app, 'planner');
    const other = await signInAs(app, 'planner');
    const created = await createToken(planner, 'listed');
    await createToken(other, 'not mine');
    expect((await bearer(app, created.token).get('/api/sites')).status).toBe(200);
    const response = await planner.get('/api/tokens');
    expect(response.status).toBe(200);
    expectMatchesOpenApi(response);
    expect(response.body).toHaveLength(1);
    const [listed] = response.body;
    expect(Object.keys(listed).sort()).toEqual(['createdAt', 'expiresAt', 'id', 'lastUsedAt', 'lastUsedIp', 'name']);
    expect(listed).toMatchObject({ id: created.id, name: 'listed', expiresAt: created.expiresAt });
    expect(Date.now() - Date.parse(listed.lastUsedAt)).toBeLessThan(60_000);
    expect(listed.lastUsedIp).toMatch(/127\.0\.0\.1|::1/);
    expect(JSON.stringify(response.body)).not.toContain(secretOf(created.token));
  });
});

describe('DELETE /api/tokens/:id', () => {
  it('revokes the token at once; revoking again is not an error', async () => {
    const planner = await signInAs(app, 'planner');
    const created = await createToken(planner, 'to revoke');
    expect((await bearer(app, created.token).get('/api/auth/me')).status).toBe(200);
    expect((await planner.delete(`/api/tokens/${created.id}`)).status).toBe(204);
    expect((await bearer(app, created.token).get('/api/auth/me')).status).toBe(401);
    expect((await planner.delete(`/api/tokens/${created.id}`)).status).toBe(204);
    expect((await planner.get('/api/tokens')).body).toEqual([]);
    const row = await storedRow(created.id);
    expect(row.revoked_reason).toBe('owner');
  });

  it("answers 404 for someone else's token, but lets an admin revoke it", async () => {
    const owner = await signInAs(app, 'planner');
    const stranger = await signInAs(app, 'approver');
    const admin = await signInAs(app, 'admin');
    const created = await createToken(owner, 'guarded');
    expect((await stranger.delete(`/api/tokens/${created.id}`)).status).toBe(404);
    expect((await bearer(app, created.token).get('/api/auth/me')).status).toBe(200);
    expect((await admin.delete(`/api/tokens/${created.id}`)).status).toBe(204);
    expect((await bearer(app, created.token).get('/api/auth/me')).status).toBe(401);
    expect((await storedRow(created.id)).revoked_reason).toBe('admin');
    expect((await owner.delete('/api/tokens/not-a-uuid')).status).toBe(404);
  });

  it('lets a token revoke itself, so a pipeline can rotate its own credential', async () => {
    const planner = await signInAs(app, 'planner');
    const created = await createToken(planner, 'self-revoking');
    expect((await bearer(app, created.token).delete(`/api/tokens/${created.id}`)).status).toBe(204);
    expect((await bearer(app, created.token).get('/api/auth/me')).status).toBe(401);
  });
});
