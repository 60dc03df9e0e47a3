/**
 * Backup and restore round trip (SECURITY.md test 5): `npm run db:backup`
 * writes a pg_dump custom-format archive of the database, `npm run db:restore`
 * loads it into a fresh, empty database, and every approved plan's checksum
 * still verifies there. Checksums are recomputed with the `canonicalize`
 * package (RFC 8785) and node's SHA-256, independent of the app's code.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import canonicalize from 'canonicalize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { signInAs, type SignedInAgent } from '../support/auth';
import { testDatabaseUrl } from '../support/database-url';
import { databaseUrlFor, dropDatabase, sqlAt } from '../support/scratch-database';
import { createPlace, insertDraftPlan, type Place } from '../sign-off/support';

const app = createTestApp();
const root = path.resolve(import.meta.dirname, '..', '..');
const tsx = path.join(root, 'node_modules', '.bin', 'tsx');
const dir = mkdtempSync(path.join(os.tmpdir(), 'slackwater-backup-'));
const archive = path.join(dir, 'slackwater.dump');
const restoredName = `slackwater_restored_${process.pid}_${Date.now()}`;

let planner: SignedInAgent;
let approver: SignedInAgent;
let place: Place;
const approved = new Map<string, string>();

/** Runs one of the npm scripts' entry points the way `npm run` does, against the test database. */
function script(name: string, args: string[]) {
  return spawnSync(tsx, [path.join(root, 'scripts', name), ...args], {
    cwd: root,
    encoding: 'utf8',
    env: { ...process.env, DATABASE_URL: testDatabaseUrl() },
    timeout: 120_000,
  });
}

/** Plans whose stored checksum does not match their stored content, computed outside the app. */
async function mismatching(url: string): Promise<Set<string>> {
  const rows = await sqlAt<{ id: string; checksum: string; inputs: unknown; results: unknown }>(
    url,
    "select id, checksum, inputs, results from plans where status in ('approved', 'superseded')",
  );
  const sha = (r: (typeof rows)[number]) =>
    createHash('sha256')
      .update(canonicalize({ planId: r.id, inputs: r.inputs, results: r.results }) ?? '')
      .digest('hex');
  return new Set(rows.filter((r) => sha(r) !== r.checksum).map((r) => r.id));
}

beforeAll(async () => {
  [planner, approver] = await Promise.all([signInAs(app, 'planner'), signInAs(app, 'approver')]);
  place = await createPlace(planner);
  // Three approvals on one battery: the second supersedes the first, the third stands apart.
  for (const window of [
    { fromHour: 0, hours: 12 },
    { fromHour: 6, hours: 12 },
    { fromHour: 24, hours: 12 },
  ]) {
    const plan = await insertDraftPlan(place, planner.user.id, window);
    await planner.post(`/api/plans/${plan.id}/submit`).send({ version: 1 });
    const response = await approver.post(`/api/plans/${plan.id}/approve`).send({ version: 2, comment: 'ok' });
    expect(response.status).toBe(200);
    approved.set(plan.id, response.body.checksum as string);
  }
});

afterAll(async () => {
  await dropDatabase(restoredName);
  rmSync(dir, { recursive: true, force: true });
});

describe('backup and restore', () => {
  it('npm run db:backup writes a pg_dump custom-format archive', () => {
    const run = script('db-backup.ts', [archive]);
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toMatch(/pg_dump custom format/);
    // [S: PostgreSQL source, pg_backup_archiver.c] custom archives start with the magic "PGDMP".
    expect(readFileSync(archive).subarray(0, 5).toString('latin1')).toBe('PGDMP');
  });

  it('npm run db:restore loads it into a fresh database where every approved plan still verifies', async () => {
    const run = script('db-restore.ts', [archive, '--into', restoredName]);
    const restoredUrl = databaseUrlFor(restoredName);
    // Other test files may have tampered plans on purpose before the dump; the script
    // reports those (and only those) and exits 1 then. Tampering is never undone, so
    // whatever mismatches in the copy must also mismatch in the source now.
    const [inCopy, inSource] = await Promise.all([mismatching(restoredUrl), mismatching(testDatabaseUrl())]);
    expect([...inCopy].filter((id) => !inSource.has(id))).toEqual([]);
    expect(run.status, run.stderr).toBe(inCopy.size === 0 ? 0 : 1);
    expect(run.stdout).toMatch(new RegExp(`Restored .* into "${restoredName}"`));
    expect(run.stdout).toMatch(/Signed-off plans checked: \d+; checksums verified: \d+/);

    const rows = await sqlAt<{ id: string; status: string; checksum: string }>(
      restoredUrl,
      'select id, status, checksum from plans where id = any($1)',
      [[...approved.keys()]],
    );
    expect(rows).toHaveLength(3);
    for (const row of rows) {
      expect(row.checksum).toBe(approved.get(row.id));
      expect(inCopy.has(row.id)).toBe(false);
    }
    expect(rows.map((r) => r.status).sort()).toEqual(['approved', 'approved', 'superseded']);
  });

  it('restores the guards too: the copy refuses changes to an approved plan', async () => {
    const [id] = [...approved.keys()].slice(-1);
    await expect(sqlAt(databaseUrlFor(restoredName), 'delete from plans where id = $1', [id])).rejects.toThrow(
      /signed-off plan cannot be deleted/,
    );
    await expect(sqlAt(databaseUrlFor(restoredName), "update plan_events set comment = 'x'")).rejects.toThrow(/append-only/);
  });

  it('refuses to restore into a database that is not empty, and changes nothing there', async () => {
    const before = await sqlAt<{ n: number }>(databaseUrlFor(restoredName), 'select count(*)::int as n from plans');
    const run = script('db-restore.ts', [archive, '--into', restoredName]);
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(new RegExp(`The database "${restoredName}" is not empty .* so nothing was restored`));
    expect(await sqlAt<{ n: number }>(databaseUrlFor(restoredName), 'select count(*)::int as n from plans')).toEqual(before);
  });

  it('refuses a file that is not a pg_dump archive, naming it', () => {
    const bogus = path.join(dir, 'not-a-dump.sql');
    writeFileSync(bogus, 'select 1;\n');
    const run = script('db-restore.ts', [bogus, '--into', `${restoredName}_x`]);
    expect(run.status).toBe(1);
    expect(run.stderr).toContain(`${bogus} is not a pg_dump custom-format archive`);
  });
});
