/**
 * Tokens have their own rate limit, and invalid tokens are limited per client address
 * (ASVS 4.0.3 2.2.1 applies the same idea to passwords). The limits are set low here
 * through the environment, as an operator would set them.
 */
import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp } from '../support/test-app';
import { signInAs } from '../support/auth';
import { bearer, createToken } from '../support/tokens';

const app = createTestApp({ API_TOKEN_REQUESTS_PER_MINUTE: '3', API_TOKEN_FAILURES_PER_ADDRESS: '2' });

describe('token rate limits', () => {
  it('answer 429 once one token passes its requests per minute, without slowing another token or the browser', async () => {
    const planner = await signInAs(app, 'planner');
    const first = await createToken(planner, 'busy');
    const second = await createToken(planner, 'quiet');
    const statuses = [];
    for (let i = 0; i < 4; i += 1) statuses.push((await bearer(app, first.token).get('/api/sites')).status);
    expect(statuses).toEqual([200, 200, 200, 429]);
    const limited = await bearer(app, first.token).get('/api/sites');
    expect(limited.body.error).toMatch(/more than 3 requests in a minute/);
    expect(limited.headers['retry-after']).toBeDefined();
    expect((await bearer(app, second.token).get('/api/sites')).status).toBe(200);
    for (let i = 0; i < 4; i += 1) expect((await planner.get('/api/sites')).status).toBe(200);
  });

  it('answer 429 to an address that keeps sending invalid tokens', async () => {
    const bad = () => request(app).get('/api/sites').set('Authorization', 'Bearer swt_nonsense');
    expect((await bad()).status).toBe(401);
    expect((await bad()).status).toBe(401);
    const third = await bad();
    expect(third.status).toBe(429);
    expect(third.body.error).toMatch(/invalid API token/);
  });
});
