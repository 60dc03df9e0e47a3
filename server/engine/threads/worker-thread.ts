/**
 * The one way Slackwater starts a worker thread (the job threads, the horizon
 * preview's thread, a study's parallel runs). A thread's entry sits next to the
 * module that starts it, with that module's own file extension: .ts under tsx
 * (development, tests, `npm run worker`), .mjs in the command-line bundle
 * (scripts/cli-bundle.mjs), .js in a compiled build. Under tsx on Node 20 a thread
 * cannot load TypeScript by itself (ERR_UNKNOWN_FILE_EXTENSION), so it starts from
 * a small eval that registers tsx's ESM loader first, then imports the entry.
 */
import { createRequire } from 'node:module';
import { dirname, extname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';

/** The entry `name` next to the module at `moduleUrl` (its `import.meta.url`), with that module's extension. */
export function siblingEntry(moduleUrl: string, name: string): URL {
  return new URL(`./${name}${extname(new URL(moduleUrl).pathname)}`, moduleUrl);
}

let tsxApi: string | null = null;

/** The ESM build of tsx's API (its package exports map "tsx/esm/api" to it for import). */
function tsxApiUrl(): string {
  tsxApi ??= pathToFileURL(
    join(dirname(createRequire(import.meta.url).resolve('tsx/package.json')), 'dist/esm/api/index.mjs'),
  ).href;
  return tsxApi;
}

export function startWorkerThread(entry: URL): Worker {
  if (!entry.pathname.endsWith('.ts')) return new Worker(entry);
  const bootstrap = `import(${JSON.stringify(tsxApiUrl())}).then((api) => { api.register(); return import(${JSON.stringify(entry.href)}); });`;
  return new Worker(bootstrap, { eval: true });
}
