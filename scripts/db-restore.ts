/**
 * `npm run db:restore -- FILE [--into NAME|URL]`: restores a `npm run db:backup`
 * archive with pg_restore into an empty database, then recomputes the checksum
 * of every signed-off plan and says whether each still verifies (SECURITY.md,
 * "Backup and restore"). The target is DATABASE_URL or the private cluster's
 * database (SLACKWATER_DB_NAME, default `slackwater`); `--into NAME` picks
 * another database on the same server (created when missing), `--into URL`
 * any other. A database that already holds tables is refused, never merged into.
 */
import { spawnSync } from 'node:child_process';
import { closeSync, existsSync, openSync, readSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import pg from 'pg';
import { ensureDatabase } from './lib/database';
import { SetupError } from './lib/postgres';
import { appDatabaseUrl, databaseName, findPgTool, libpqEnv } from './db-backup';
import { closeDb, initDb } from '../server/db/client';
import { verifySignedOffPlans, type ChecksumReport } from '../server/sign-off/verify-checksums';

/** pg_dump's custom format starts with the bytes "PGDMP" (pg_backup_archiver.c). */
function assertCustomArchive(file: string): void {
  if (!existsSync(file)) throw new SetupError(`No backup file at ${file}. Give the path of a file written by npm run db:backup.`);
  const fd = openSync(file, 'r');
  const head = Buffer.alloc(5);
  try {
    readSync(fd, head, 0, 5, 0);
  } finally {
    closeSync(fd);
  }
  if (head.toString('latin1') !== 'PGDMP') {
    throw new SetupError(
      `${file} is not a pg_dump custom-format archive (it does not start with PGDMP). Use a file written by npm run db:backup.`,
    );
  }
}

/** Names of the tables and sequences outside PostgreSQL's own schemas. */
async function existingRelations(url: string): Promise<string[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const { rows } = await client.query<{ name: string }>(
      `select n.nspname || '.' || c.relname as name from pg_class c join pg_namespace n on n.oid = c.relnamespace
        where c.relkind in ('r', 'p', 'v', 'm', 'S') and n.nspname not in ('pg_catalog', 'information_schema')
          and n.nspname not like 'pg\\_%' order by 1 limit 6`,
    );
    return rows.map((r) => r.name);
  } finally {
    await client.end();
  }
}

/** Restores `file` into the (empty) database at `url`; throws with pg_restore's message on failure. */
export async function restoreDatabase(file: string, url: string): Promise<void> {
  assertCustomArchive(file);
  await ensureDatabase(url);
  const found = await existingRelations(url);
  if (found.length > 0) {
    throw new SetupError(
      `The database "${databaseName(url)}" is not empty (it holds ${found.slice(0, 5).join(', ')}${found.length > 5 ? ', …' : ''}), so nothing was restored.\n` +
        'Restore into a new database instead: npm run db:restore -- FILE --into slackwater_restored',
    );
  }
  // One transaction: a failed restore leaves the database as empty as it was.
  const args = [
    '--exit-on-error',
    '--single-transaction',
    '--no-owner',
    '--no-privileges',
    '--no-password',
    `--dbname=${databaseName(url)}`,
    file,
  ];
  const run = spawnSync(findPgTool('pg_restore'), args, { env: libpqEnv(url), encoding: 'utf8' });
  if (run.status !== 0)
    throw new SetupError(
      `pg_restore into "${databaseName(url)}" failed; nothing was restored:\n${run.stderr || run.error?.message || ''}`.trim(),
    );
}

/** Recomputes the checksum of every approved or superseded plan in the database at `url`. */
export async function verifyRestoredChecksums(url: string): Promise<ChecksumReport> {
  const db = initDb(url, 2);
  try {
    return await verifySignedOffPlans(db);
  } finally {
    await closeDb();
  }
}

function targetUrl(base: string, into: string | undefined): string {
  if (!into) return base;
  if (into.includes('://')) return into;
  if (!/^[a-z_][a-z0-9_]*$/.test(into))
    throw new SetupError(`"${into}" is not a usable database name: use lower-case letters, digits and _.`);
  const u = new URL(base);
  u.pathname = `/${into}`;
  return u.toString();
}

async function main(): Promise<void> {
  const log = (m: string) => console.log(m);
  const args = process.argv.slice(2);
  const intoAt = args.indexOf('--into');
  const into = intoAt >= 0 ? args[intoAt + 1] : undefined;
  const file = args.find((a, i) => !a.startsWith('--') && (intoAt < 0 || i !== intoAt + 1));
  if (!file) throw new SetupError('usage: npm run db:restore -- FILE [--into DATABASE_NAME]');
  const url = targetUrl(await appDatabaseUrl(log), into);
  await restoreDatabase(file, url);
  log(`Restored ${file} into "${databaseName(url)}".`);
  const report = await verifyRestoredChecksums(url);
  log(`Signed-off plans checked: ${report.checked}; checksums verified: ${report.verified}.`);
  for (const bad of report.mismatches) log(`  MISMATCH: plan ${bad.planId} (${bad.status}): ${bad.reason}`);
  if (report.mismatches.length > 0) process.exitCode = 1;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((error: unknown) => {
    console.error(error instanceof SetupError ? error.message : error);
    process.exit(1);
  });
}
