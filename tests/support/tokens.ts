/**
 * API-token helpers for tests: a token for a signed-in user, a supertest request that
 * sends only `Authorization: Bearer` (no cookie, no Origin), and a token made to expire.
 *
 *   const { token } = await createToken(planner, 'pipeline');
 *   await bearer(app, token).post('/api/sites').send({...});
 */
import request from 'supertest';
import type { App } from 'supertest/types';
import { expect } from 'vitest';
import { getPool } from '../../server/db/client';
import type { SignedInAgent } from './auth';

export interface TestToken {
  id: string;
  name: string;
  token: string;
  expiresAt: string;
}

export async function createToken(agent: SignedInAgent, name = `test token ${Math.random().toString(36).slice(2, 8)}`) {
  const response = await agent.post('/api/tokens').send({ name });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body as TestToken;
}

/** The secret part of a token (it may itself hold `_`): after `swt_`, 32 hex digits and `_`. */
export const secretOf = (token: string) => token.slice('swt_'.length + 33);

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete' | 'head';

/** A client that authenticates only with the token: no cookie jar, no Origin header. */
export function bearer(app: App, token: string) {
  const send = (method: Method) => (url: string) => request(app)[method](url).set('Authorization', `Bearer ${token}`);
  return {
    get: send('get'),
    post: send('post'),
    patch: send('patch'),
    put: send('put'),
    delete: send('delete'),
    head: send('head'),
  };
}

/** Moves a token's expiry into the past (its creation too, for the table's CHECK). */
export async function expireToken(id: string): Promise<void> {
  await getPool().query(
    "update api_tokens set created_at = now() - interval '2 days', expires_at = now() - interval '1 second' where id = $1",
    [id],
  );
}
