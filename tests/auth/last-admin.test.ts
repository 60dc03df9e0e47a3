/**
 * "An admin cannot remove the last admin": run in a database of its own, because the
 * shared test database holds admins made by other test files running at the same time.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDb, getDb, initDb } from '../../server/db/client';
import { users } from '../../server/users/users.schema';
import { ensureDatabase, migrateDatabase } from '../../scripts/lib/database';
import { scratchDatabase } from '../support/scratch-database';
import { createTestApp } from '../support/test-app';
import { createUser, signInAs } from '../support/auth';

const scratch = scratchDatabase('last_admin');

let app: ReturnType<typeof createTestApp>;

beforeAll(async () => {
  await ensureDatabase(scratch.url);
  await migrateDatabase(scratch.url);
  initDb(scratch.url, 5); // createTestApp and the helpers reuse this pool
  app = createTestApp();
});

afterAll(async () => {
  await closeDb();
  await scratch.drop();
});

describe('the last active admin', () => {
  it('cannot be demoted or disabled, by themselves or anyone; with a second admin both become possible', async () => {
    const solo = await signInAs(app, 'admin');
    const demote = await solo.patch(`/api/users/${solo.user.id}`).send({ role: 'planner' });
    expect(demote.status).toBe(409);
    expect(demote.body.error).toMatch(/last active admin/);
    expect((await solo.patch(`/api/users/${solo.user.id}`).send({ disabled: true })).status).toBe(409);
    const [row] = await getDb().select().from(users).where(eq(users.id, solo.user.id));
    expect(row).toMatchObject({ role: 'admin', disabled: false });

    // A disabled admin does not count as someone who can still manage users.
    await createUser('admin', { disabled: true });
    expect((await solo.patch(`/api/users/${solo.user.id}`).send({ role: 'viewer' })).status).toBe(409);

    const second = await createUser('admin');
    expect((await solo.patch(`/api/users/${second.id}`).send({ disabled: true })).status).toBe(200);
    expect((await solo.patch(`/api/users/${second.id}`).send({ disabled: false })).status).toBe(200);
    expect((await solo.patch(`/api/users/${solo.user.id}`).send({ role: 'planner' })).status).toBe(200);
    // Now `second` is the last one.
    const secondAgent = await signInAs(app, second);
    expect((await secondAgent.patch(`/api/users/${second.id}`).send({ role: 'viewer' })).status).toBe(409);
  });

  it('survives two admins demoting each other at the same moment: exactly one change wins', async () => {
    const a = await signInAs(app, 'admin');
    const b = await signInAs(app, 'admin');
    const activeAdmins = async () =>
      (await getDb().select().from(users).where(eq(users.role, 'admin'))).filter((u) => !u.disabled);
    // Leave exactly these two active admins.
    for (const u of await activeAdmins()) {
      if (u.id !== a.user.id && u.id !== b.user.id) await a.patch(`/api/users/${u.id}`).send({ role: 'viewer' }).expect(200);
    }
    const [ra, rb] = await Promise.all([
      a.patch(`/api/users/${b.user.id}`).send({ role: 'viewer' }),
      b.patch(`/api/users/${a.user.id}`).send({ role: 'viewer' }),
    ]);
    expect([ra.status, rb.status].sort()).toEqual([200, 409]);
    expect(await activeAdmins()).toHaveLength(1);
  });
});
