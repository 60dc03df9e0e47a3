// Installs npm dependencies when they are missing (fresh clone). Plain JavaScript:
// it must run before TypeScript tooling exists.
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import path from 'node:path';

export function ensureDependencies(root) {
  if (existsSync(path.join(root, 'node_modules', '.bin', 'tsx'))) return;
  const lock = existsSync(path.join(root, 'package-lock.json'));
  console.log(`Installing dependencies (npm ${lock ? 'ci' : 'install'})…`);
  const result = spawnSync('npm', [lock ? 'ci' : 'install', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error('npm could not install the dependencies; see the output above.');
    process.exit(1);
  }
}

/** Runs a local binary from node_modules/.bin (not through npx, so signals reach it). */
export function runBin(root, bin, args, options = {}) {
  const result = spawnSync(path.join(root, 'node_modules', '.bin', bin), args, { cwd: root, stdio: 'inherit', ...options });
  return result.status ?? 1;
}
