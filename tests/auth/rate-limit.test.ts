/**
 * Sign-in rate limits: at most 100 failed attempts per account per hour (ASVS 4.0.3
 * 2.2.1) and a limit per client address. The counts live in PostgreSQL, so the limit
 * holds across processes; the tests fill the window by inserting attempts directly.
 */
import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { sql } from 'drizzle-orm';
import { getDb } from '../../server/db/client';
import { authAttempts } from '../../server/auth/auth.schema';
import { attemptLimits } from '../../server/auth/auth.service';
import { createTestApp, testOrigin } from '../support/test-app';
import { createUser, testPassword } from '../support/auth';

const app = createTestApp();

/** A documentation address (RFC 5737) of its own per test, passed through the loopback proxy. */
const address = (n: number) => `198.51.100.${n}`;
const signIn = (email: string, password: string, ip: string) =>
  request(app).post('/api/auth/sign-in').set('Origin', testOrigin).set('X-Forwarded-For', ip).send({ email, password });

async function insertFailures(n: number, email: string, ip: string, minutesAgo = 1) {
  const at = sql`now() - make_interval(mins => ${minutesAgo})`;
  const rows = Array.from({ length: n }, () => ({ kind: 'sign-in' as const, email, ip, success: false, at }));
  await getDb()
    .insert(authAttempts)
    .values(rows as never);
}

describe('the per-account limit', () => {
  it('is 100 failures per hour, as ASVS 4.0.3 2.2.1 allows', () => {
    expect(attemptLimits['sign-in'].perAccount).toBe(100);
  });

  it('lets the 100th failure through and then answers 429 even with the right password, with Retry-After', async () => {
    const user = await createUser('planner');
    await insertFailures(99, user.email, address(10));
    const hundredth = await signIn(user.email, 'wrong-password-guess', address(11));
    expect(hundredth.status).toBe(401);
    const blocked = await signIn(user.email, testPassword, address(12));
    expect(blocked.status).toBe(429);
    expect(blocked.body.error).toMatch(/Too many failed attempts/);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(3000); // oldest failure 1 minute ago → ~59 minutes
    expect(blocked.headers['set-cookie']).toBeUndefined();
  });

  it('counts only the last hour: failures older than that no longer block', async () => {
    const user = await createUser('planner');
    await insertFailures(150, user.email, address(20), 61);
    expect((await signIn(user.email, testPassword, address(21))).status).toBe(200);
  });

  it('blocks an unknown e-mail the same way, so the limit does not reveal which accounts exist', async () => {
    const email = `nobody-${Date.now()}@test.slackwater.example`;
    await insertFailures(100, email, address(30));
    const response = await signIn(email, testPassword, address(31));
    expect(response.status).toBe(429);
  });
});

describe('the per-address limit', () => {
  it('blocks an address after its failures across many accounts, and leaves other addresses alone', async () => {
    const user = await createUser('viewer');
    const ip = address(40 + (Date.now() % 50));
    await insertFailures(attemptLimits['sign-in'].perAddress, `spray-${Date.now()}@test.slackwater.example`, ip);
    expect((await signIn(user.email, testPassword, ip)).status).toBe(429);
    expect((await signIn(user.email, testPassword, address(99))).status).toBe(200);
  });
});
