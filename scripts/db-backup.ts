/**
 * `npm run db:backup [FILE]`: writes a pg_dump archive in the custom format
 * (compressed, restorable with pg_restore, tables in any order) of the app's
 * database: DATABASE_URL, or the private cluster's database (SLACKWATER_DB_NAME,
 * default `slackwater`). Default file: backups/slackwater-<database>-<UTC time>.dump.
 * The connection goes to pg_dump through libpq's environment variables, so a
 * password never appears on a command line (visible to every user in `ps`).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { clusterUrl, ensureCluster, projectRoot, SetupError } from './lib/postgres';

/** libpq environment (PGHOST, PGPORT, …) for a postgres:// URL. */
export function libpqEnv(url: string): NodeJS.ProcessEnv {
  const u = new URL(url);
  const env: NodeJS.ProcessEnv = { ...process.env };
  for (const key of ['PGHOST', 'PGPORT', 'PGUSER', 'PGPASSWORD', 'PGDATABASE', 'PGSSLMODE', 'DATABASE_URL']) delete env[key];
  const host = u.searchParams.get('host') ?? u.hostname.replace(/^\[|\]$/g, '');
  if (host) env.PGHOST = decodeURIComponent(host);
  if (u.port) env.PGPORT = u.port;
  if (u.username) env.PGUSER = decodeURIComponent(u.username);
  if (u.password) env.PGPASSWORD = decodeURIComponent(u.password);
  env.PGDATABASE = decodeURIComponent(u.pathname.slice(1));
  const sslmode = u.searchParams.get('sslmode');
  if (sslmode) env.PGSSLMODE = sslmode;
  return env;
}

/** A PostgreSQL client tool: on PATH (Debian's wrapper), else the newest /usr/lib/postgresql/N/bin. */
export function findPgTool(tool: 'pg_dump' | 'pg_restore'): string {
  const probe = spawnSync(tool, ['--version'], { encoding: 'utf8' });
  if (probe.status === 0) return tool;
  const base = '/usr/lib/postgresql';
  const versions = existsSync(base) ? readdirSync(base).filter((v) => existsSync(path.join(base, v, 'bin', tool))) : [];
  const newest = versions.sort((a, b) => Number(b) - Number(a))[0];
  if (newest) return path.join(base, newest, 'bin', tool);
  throw new SetupError(
    `${tool} was not found. Install the PostgreSQL client tools (Debian: apt-get install -y postgresql-client) and run again.`,
  );
}

/** The database the scripts act on, starting the private cluster when DATABASE_URL is not set. */
export async function appDatabaseUrl(log: (m: string) => void): Promise<string> {
  if (process.env.DATABASE_URL) return process.env.DATABASE_URL;
  await ensureCluster(log);
  return clusterUrl(process.env.SLACKWATER_DB_NAME ?? 'slackwater');
}

export function databaseName(url: string): string {
  return decodeURIComponent(new URL(url).pathname.slice(1));
}

/** Runs pg_dump -Fc; throws with pg_dump's own message when it fails. Returns the archive size in bytes. */
export function backupDatabase(url: string, file: string): number {
  mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const run = spawnSync(findPgTool('pg_dump'), ['--format=custom', '--no-password', `--file=${file}`], {
    env: libpqEnv(url),
    encoding: 'utf8',
  });
  if (run.status !== 0) {
    throw new SetupError(`pg_dump of database "${databaseName(url)}" failed:\n${run.stderr || run.error?.message || ''}`.trim());
  }
  return statSync(file).size;
}

function defaultFile(url: string): string {
  const stamp = new Date()
    .toISOString()
    .replace(/[-:]/g, '')
    .replace(/\.\d+Z$/, 'Z');
  return path.join(projectRoot, 'backups', `slackwater-${databaseName(url)}-${stamp}.dump`);
}

async function main(): Promise<void> {
  const log = (m: string) => console.log(m);
  const url = await appDatabaseUrl(log);
  const file = process.argv[2] ?? defaultFile(url);
  const bytes = backupDatabase(url, file);
  log(`Backup of "${databaseName(url)}" written to ${file} (${(bytes / 1024).toFixed(0)} KiB, pg_dump custom format).`);
  log(`Restore it into an empty database with: npm run db:restore -- ${file} --into <new database name>`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((error: unknown) => {
    console.error(error instanceof SetupError ? error.message : error);
    process.exit(1);
  });
}
