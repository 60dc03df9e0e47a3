// `npm run cli -- <command> …`: the engine command line (its contract).
// Runs the prebuilt bundle in this process (see cli-bundle.mjs), rebuilding it
// first when a source changed; without esbuild it runs the sources with tsx.
// Either way stdout carries the command's JSON only and the exit code is the command's.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { ensureCliBundle } from './cli-bundle.mjs';

const root = path.resolve(import.meta.dirname, '..');
// SLACKWATER_CLI_SOURCES=1 runs the TypeScript sources directly (e.g. to compare with the bundle).
const bundle = process.env.SLACKWATER_CLI_SOURCES === '1' ? null : await ensureCliBundle(root);
if (bundle) {
  // The bundle reads process.argv.slice(2), which are this launcher's arguments too.
  await import(pathToFileURL(bundle).href);
} else {
  const tsx = path.join(root, 'node_modules', '.bin', 'tsx');
  const result = spawnSync(tsx, [path.join(root, 'server', 'engine', 'cli', 'main.ts'), ...process.argv.slice(2)], {
    stdio: 'inherit',
  });
  if (result.error) process.stderr.write(`internal error: cannot run ${tsx}: ${result.error.message}\n`);
  process.exitCode = result.status ?? 1;
}
