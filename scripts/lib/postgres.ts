/**
 * A private PostgreSQL cluster for development, demo and tests: Debian's server
 * binaries, data under the git-ignored `.data/pg`, listening on 127.0.0.1 only.
 * Trust authentication is acceptable solely because the cluster listens on
 * loopback of a single-user machine; real installations set DATABASE_URL.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, readdirSync, writeFileSync, appendFileSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';

export const projectRoot = path.resolve(import.meta.dirname, '..', '..');
export const dataDir = path.join(projectRoot, '.data', 'pg');
export const logFile = path.join(projectRoot, '.data', 'postgres.log');
export const clusterPort = Number(process.env.SLACKWATER_PG_PORT ?? 54329);

const isRoot = process.getuid?.() === 0;

export class SetupError extends Error {}

function findPgBin(): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(path.join(base, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(base, versions[0], 'bin') : null;
}

/** Installs Debian's PostgreSQL server when missing (as root), or says exactly what to run. */
export function ensurePostgresInstalled(log: (m: string) => void): string {
  let bin = findPgBin();
  if (bin) return bin;
  if (!isRoot) {
    throw new SetupError(
      'PostgreSQL server binaries were not found under /usr/lib/postgresql.\n' +
        'Install them once with:  sudo apt-get update && sudo apt-get install -y postgresql\n' +
        'or point DATABASE_URL at an existing PostgreSQL server.',
    );
  }
  log('Installing PostgreSQL from Debian packages (apt-get, about a minute)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const update = spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  const install = spawnSync('apt-get', ['install', '-y', '-qq', 'postgresql'], { stdio: 'inherit', env });
  if (update.status !== 0 || install.status !== 0) {
    throw new SetupError('apt-get could not install postgresql; see the output above.');
  }
  bin = findPgBin();
  if (!bin) throw new SetupError('postgresql was installed but initdb was not found under /usr/lib/postgresql.');
  return bin;
}

/** Runs a cluster tool as the `postgres` user when we are root (initdb refuses root). */
function runPg(bin: string, tool: string, args: string[]): { ok: boolean; output: string } {
  const exe = path.join(bin, tool);
  const [cmd, cmdArgs] = isRoot ? ['runuser', ['-u', 'postgres', '--', exe, ...args]] : [exe, args];
  const result = spawnSync(cmd, cmdArgs, { encoding: 'utf8' });
  return { ok: result.status === 0, output: `${result.stdout ?? ''}${result.stderr ?? ''}` };
}

function ensureDataDir(): void {
  mkdirSync(path.dirname(dataDir), { recursive: true });
  if (isRoot) {
    // Every folder above the data directory must be enterable by `postgres`.
    execFileSync('install', ['-d', '-o', 'postgres', '-g', 'postgres', '-m', '700', dataDir]);
    execFileSync('chmod', ['a+x', path.dirname(dataDir)]);
    writeFileSync(logFile, '', { flag: 'a' });
    execFileSync('chown', ['postgres:postgres', logFile]);
  } else {
    mkdirSync(dataDir, { recursive: true, mode: 0o700 });
  }
}

function portIsFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(false));
    server.listen(port, '127.0.0.1', () => server.close(() => resolve(true)));
  });
}

function clusterIsRunning(bin: string): boolean {
  return runPg(bin, 'pg_ctl', ['-D', dataDir, 'status']).ok;
}

/** Creates (once) and starts (when stopped) the private cluster. Idempotent. */
export async function ensureCluster(log: (m: string) => void): Promise<void> {
  const bin = ensurePostgresInstalled(log);
  const initialised = existsSync(path.join(dataDir, 'PG_VERSION'));
  if (!initialised) {
    ensureDataDir();
    log(`Creating a private PostgreSQL cluster in ${dataDir}`);
    const init = runPg(bin, 'initdb', ['-D', dataDir, '-U', 'postgres', '--auth=trust', '--encoding=UTF8', '--locale=C.UTF-8']);
    if (!init.ok) {
      throw new SetupError(`initdb failed:\n${init.output}\nRemove ${dataDir} and run again.`);
    }
    appendFileSync(
      path.join(dataDir, 'postgresql.conf'),
      `\n# Slackwater private cluster: loopback only\nlisten_addresses = '127.0.0.1'\nport = ${clusterPort}\nunix_socket_directories = '${dataDir}'\nmax_connections = 200\nfsync = on\n`,
    );
  }
  if (clusterIsRunning(bin)) return;
  if (!(await portIsFree(clusterPort))) {
    throw new SetupError(
      `Port ${clusterPort} on 127.0.0.1 is already in use by another program, so the private PostgreSQL cluster cannot start.\n` +
        `Stop that program, or choose another port with SLACKWATER_PG_PORT (delete ${dataDir} first so it is re-created on the new port).`,
    );
  }
  ensureDataDir();
  const configured = readFileSync(path.join(dataDir, 'postgresql.conf'), 'utf8').match(/^port = (\d+)/m)?.[1];
  const start = runPg(bin, 'pg_ctl', ['-D', dataDir, '-l', logFile, '-o', `-p ${clusterPort}`, '-w', '-t', '60', 'start']);
  if (!start.ok) {
    throw new SetupError(
      `PostgreSQL failed to start (configured port ${configured ?? '?'}). See the log: ${logFile}\n${start.output}`,
    );
  }
}

/** Stops the private cluster if it runs. */
export function stopCluster(log: (m: string) => void): void {
  const bin = findPgBin();
  if (!bin || !existsSync(path.join(dataDir, 'PG_VERSION'))) return log('No private cluster to stop.');
  if (!clusterIsRunning(bin)) return log('The private cluster is already stopped.');
  const stop = runPg(bin, 'pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
  if (!stop.ok) throw new SetupError(`pg_ctl stop failed:\n${stop.output}`);
  log('PostgreSQL stopped.');
}

export function clusterUrl(database: string): string {
  return `postgres://postgres@127.0.0.1:${clusterPort}/${database}`;
}
