/**
 * `Idempotency-Key` on POST, as the IETF HTTPAPI draft "The Idempotency-Key HTTP Header
 * Field" describes it: the first answer is kept 24 hours per user, key and route and
 * replayed to a retry; the same key with another body is refused (422); a key whose
 * first request still runs answers 409; failed requests keep nothing.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { getPool } from '../../server/db/client';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { bearer, createToken } from '../support/tokens';
import { createSite, uniqueName, upload } from '../support/api-fixtures';
import { sample } from '../profiles/support';

const app = createTestApp();
let planner: SignedInAgent;
beforeAll(async () => {
  planner = await signInAs(app, 'planner');
});

const siteBody = () => ({ name: uniqueName('Keyed site'), timezone: 'Europe/Berlin', currency: 'EUR' });
const sitesNamed = async (name: string) =>
  (await getPool().query<{ n: number }>('select count(*)::int as n from sites where name = $1', [name])).rows[0]?.n;
const newKey = () => `key-${Math.random().toString(36).slice(2)}`;

describe('a POST with an Idempotency-Key', () => {
  it('replays the first answer to a retry with the same key and body, and changes nothing', async () => {
    const body = siteBody();
    const key = newKey();
    const first = await planner.post('/api/sites').set('Idempotency-Key', key).send(body);
    expect(first.status).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    const retry = await planner
      .post('/api/sites')
      .set('Idempotency-Key', `"${key}"`)
      .send({ ...body });
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body).toEqual(first.body);
    expect(await sitesNamed(body.name)).toBe(1);
  });

  it('refuses the same key with a different body (422), and keeps keys apart per route and per user', async () => {
    const key = newKey();
    expect((await planner.post('/api/sites').set('Idempotency-Key', key).send(siteBody())).status).toBe(201);
    const reused = await planner.post('/api/sites').set('Idempotency-Key', key).send(siteBody());
    expect(reused.status).toBe(422);
    expect(reused.body.error).toMatch(/different request/);
    const otherUser = await signInAs(app, 'planner');
    expect((await otherUser.post('/api/sites').set('Idempotency-Key', key).send(siteBody())).status).toBe(201);
    expect(
      (
        await planner
          .post('/api/tokens')
          .set('Idempotency-Key', key)
          .send({ name: uniqueName('t') })
      ).status,
    ).toBe(201);
  });

  it('keeps nothing when the request fails, so a corrected retry with the same key runs', async () => {
    const key = newKey();
    const bad = await planner.post('/api/sites').set('Idempotency-Key', key).send({ name: 'x', timezone: 'Mars/Olympus' });
    expect(bad.status).toBe(422);
    const body = siteBody();
    const fixed = await planner.post('/api/sites').set('Idempotency-Key', key).send(body);
    expect(fixed.status).toBe(201);
    expect(fixed.headers['idempotent-replayed']).toBeUndefined();
  });

  it('lets exactly one of several simultaneous requests with one key run', async () => {
    const body = siteBody();
    const key = newKey();
    const answers = await Promise.all(
      Array.from({ length: 4 }, () => planner.post('/api/sites').set('Idempotency-Key', key).send(body)),
    );
    const ran = answers.filter((a) => a.status === 201 && a.headers['idempotent-replayed'] === undefined);
    expect(ran).toHaveLength(1);
    for (const a of answers.filter((x) => !ran.includes(x))) {
      if (a.status === 409) expect(a.headers['retry-after']).toBe('1');
      else expect([a.status, a.headers['idempotent-replayed']]).toEqual([201, 'true']);
    }
    expect(await sitesNamed(body.name)).toBe(1);
  });

  it('covers uploads, file included: the same file replays, another file under the key is refused', async () => {
    const site = await createSite(planner);
    const { token } = await createToken(planner);
    const key = newKey();
    const push = (bytes: Buffer) =>
      bearer(app, token)
        .post(`/api/sites/${site.id}/profiles`)
        .set('Idempotency-Key', key)
        .field('kind', 'price')
        .field('unit', 'currency/MWh')
        .attach('file', bytes, 'week.csv');
    const week = sample('prices-week-2026-05-04-15min.csv');
    const first = await push(week);
    expect(first.status).toBe(201);
    const retry = await push(week);
    expect([retry.status, retry.headers['idempotent-replayed']]).toEqual([201, 'true']);
    const other = await push(Buffer.concat([week, Buffer.from('\n')]));
    expect(other.status).toBe(422);
  });

  it('forgets an answer after 24 hours, and takes over a key whose request died mid-way', async () => {
    const site = await createSite(planner);
    const key = newKey();
    const week = sample('prices-week-2026-05-04-15min.csv');
    const keyed = () => upload(planner, site.id, week, 'week.csv').set('Idempotency-Key', key);
    expect((await keyed()).status).toBe(201);
    await getPool().query(
      "update idempotent_requests set created_at = now() - interval '25 hours', expires_at = now() - interval '1 hour' where key = $1",
      [key],
    );
    const later = await keyed();
    // Run again for real: the same file is found stored (200), not replayed.
    expect([later.status, later.headers['idempotent-replayed']]).toEqual([200, undefined]);

    const dead = newKey();
    await getPool().query(
      `insert into idempotent_requests (user_id, key, route, fingerprint, state, created_at, expires_at)
       values ($1, $2, 'POST /api/sites', 'x', 'in_flight', now() - interval '10 minutes', now() + interval '1 day')`,
      [planner.user.id, dead],
    );
    expect((await planner.post('/api/sites').set('Idempotency-Key', dead).send(siteBody())).status).toBe(201);
  });

  it('refuses a malformed key with 400', async () => {
    for (const key of ['has space', 'x'.repeat(256), 'naïve']) {
      const response = await planner.post('/api/sites').set('Idempotency-Key', key).send(siteBody());
      expect(response.status, key).toBe(400);
      expect(response.body.error).toMatch(/Idempotency-Key/);
    }
  });
});
