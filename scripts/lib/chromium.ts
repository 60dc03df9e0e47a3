/** Debian's Chromium for browser tests; never a browser downloaded through npm. */
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { SetupError } from './postgres';

export const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export function ensureChromium(log: (m: string) => void): void {
  if (existsSync(chromiumPath)) return;
  if (process.getuid?.() !== 0) {
    throw new SetupError(
      `Chromium is missing at ${chromiumPath}. Install it once with: sudo apt-get update && sudo apt-get install -y chromium`,
    );
  }
  log('Installing Debian chromium for the browser tests (apt-get)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  const install = spawnSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit', env });
  if (install.status !== 0 || !existsSync(chromiumPath))
    throw new SetupError('apt-get could not install chromium; see the output above.');
}
