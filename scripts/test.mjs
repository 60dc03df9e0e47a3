// `npm test`: database set-up (a separate test database), type-check, lint,
// unit and integration tests against the real PostgreSQL, then browser tests.
import path from 'node:path';
import { ensureDependencies, runBin } from './ensure-deps.mjs';

const root = path.resolve(import.meta.dirname, '..');
ensureDependencies(root);

const steps = [
  ['Preparing test databases', 'tsx', ['scripts/prepare-test.ts']],
  ['Type-checking', 'tsc', ['--noEmit', '-p', 'tsconfig.json']],
  ['Checking formatting', 'prettier', ['--check', '.', '--log-level', 'warn']],
  ['Linting', 'eslint', ['.', '--max-warnings=0']],
  ['Unit and integration tests', 'vitest', ['run', '--config', 'vitest.config.ts']],
  ['Building the web client for browser tests', 'vite', ['build', '--logLevel', 'warn']],
  ['Browser tests', 'vitest', ['run', '--config', 'tests/e2e/vitest.e2e.config.ts']],
];

const only = process.env.SLACKWATER_TEST_ONLY; // e.g. "unit" to skip browser tests while developing
for (const [title, bin, args] of steps) {
  if (only === 'unit' && title.startsWith('Browser')) continue;
  console.log(`\n▶ ${title}`);
  const started = Date.now();
  const code = runBin(root, bin, args, { env: { ...process.env, NODE_ENV: 'test' } });
  console.log(`  (${((Date.now() - started) / 1000).toFixed(1)} s)`);
  if (code !== 0) {
    console.error(`\n✖ ${title} failed.`);
    process.exit(code);
  }
}
console.log('\n✔ All checks passed.');
