// The engine command line, prebuilt: one esbuild bundle of server/engine/cli/main.ts
// (plus the study worker) in dist/cli/. Running the bundle skips tsx's start-up and
// its on-the-fly transform of every engine file (about a second of CPU per call,
// measured), which matters for a command people run many times.
//
// A manifest lists every source file the bundle was built from with its size,
// mtime and SHA-256, so a launcher can tell in a few milliseconds whether the
// bundle is still current. The small pure-JavaScript packages are bundled too
// (resolving them at start-up cost more than parsing them); the LP solvers stay
// external because they load their .wasm files from next to themselves.
//
// `node scripts/cli-bundle.mjs` builds it; `import { ensureCliBundle }` builds it
// only when missing or out of date. Plain JavaScript: it runs without tsx.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

const OUT_DIR = path.join('dist', 'cli');
export const CLI_BUNDLE = path.join(OUT_DIR, 'slackwater-cli.mjs');
const MANIFEST = path.join(OUT_DIR, 'manifest.json');
const ENTRIES = {
  'slackwater-cli': 'server/engine/cli/main.ts',
  // worker-pool.ts loads `./study-worker` with its own file extension, next to itself.
  'study-worker': 'server/engine/study/study-worker.ts',
};
const EXTERNAL = ['highs', 'glpk.js', 'glpk.js/*'];
// Files that shape the output without being bundled inputs.
const SETTINGS = ['tsconfig.json', 'scripts/cli-bundle.mjs'];
const FORMAT = 2;

const sha256 = (file) => createHash('sha256').update(readFileSync(file)).digest('hex');

function describe(root, rel) {
  const file = path.join(root, rel);
  const stat = statSync(file);
  return { size: stat.size, mtimeMs: stat.mtimeMs, sha256: sha256(file) };
}

/** True when the bundle exists and every file it was built from is unchanged. */
export function cliBundleIsFresh(root) {
  let manifest;
  try {
    manifest = JSON.parse(readFileSync(path.join(root, MANIFEST), 'utf8'));
  } catch {
    return false;
  }
  if (manifest.format !== FORMAT || manifest.node !== process.versions.node) return false;
  for (const name of Object.keys(ENTRIES)) if (!existsSync(path.join(root, OUT_DIR, `${name}.mjs`))) return false;
  for (const [rel, seen] of Object.entries(manifest.inputs)) {
    let stat;
    try {
      stat = statSync(path.join(root, rel));
    } catch {
      return false;
    }
    if (stat.size !== seen.size) return false;
    // A checkout or copy may touch a file without changing it: compare content then.
    if (stat.mtimeMs !== seen.mtimeMs && sha256(path.join(root, rel)) !== seen.sha256) return false;
  }
  return true;
}

/**
 * Builds the bundle into a private folder, then renames each file into dist/cli,
 * manifest last, so concurrent launchers never run a half-written bundle.
 */
export async function buildCliBundle(root) {
  const { build } = await import('esbuild');
  mkdirSync(path.join(root, OUT_DIR), { recursive: true });
  // A file saved just before or during a build may be read by esbuild in either
  // version (file times come from a coarse clock). Build again then, so a save made
  // right before a run never leaves a bundle that looks stale on the next one.
  for (let attempt = 1; ; attempt += 1) {
    const built = await buildOnce(build, root);
    if (built.settled || attempt === MAX_ATTEMPTS) return built.bundle;
    await new Promise((resolve) => setTimeout(resolve, CLOCK_SLACK_MS + 1));
  }
}

const MAX_ATTEMPTS = 3;
// Kernel file times lag the wall clock by up to one scheduler tick (4-10 ms).
const CLOCK_SLACK_MS = 20;

async function buildOnce(build, root) {
  const started = Date.now();
  const staging = path.join(root, OUT_DIR, `.build-${process.pid}-${started}`);
  try {
    const result = await build({
      absWorkingDir: root,
      entryPoints: ENTRIES,
      outdir: staging,
      outExtension: { '.js': '.mjs' },
      bundle: true,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      external: EXTERNAL,
      tsconfig: 'tsconfig.json',
      sourcemap: 'linked',
      metafile: true,
      logLevel: 'warning',
      // Bundled CommonJS packages may call require() for Node built-ins.
      banner: {
        js: "// Built by scripts/cli-bundle.mjs from server/engine; do not edit.\nimport { createRequire as __createRequire } from 'node:module';\nconst require = __createRequire(import.meta.url);",
      },
    });
    const inputs = {};
    let settled = true;
    for (const rel of [...Object.keys(result.metafile.inputs), ...SETTINGS].sort()) {
      const seen = describe(root, rel);
      // Possibly edited while esbuild read it: the bundle may hold either version, so
      // record it as unseen (the next run builds again) unless a rebuild settles it.
      const unsure = seen.mtimeMs >= started - CLOCK_SLACK_MS;
      if (unsure) settled = false;
      inputs[rel] = unsure ? { ...seen, size: -1 } : seen;
    }
    for (const name of Object.keys(ENTRIES)) {
      for (const ext of ['.mjs', '.mjs.map']) renameSync(path.join(staging, name + ext), path.join(root, OUT_DIR, name + ext));
    }
    const manifest = { format: FORMAT, node: process.versions.node, builtAt: new Date().toISOString(), entries: ENTRIES, inputs };
    writeFileSync(path.join(staging, 'manifest.json'), `${JSON.stringify(manifest, null, 1)}\n`);
    renameSync(path.join(staging, 'manifest.json'), path.join(root, MANIFEST));
    return { bundle: path.join(root, CLI_BUNDLE), settled };
  } finally {
    rmSync(staging, { recursive: true, force: true });
  }
}

/**
 * The bundle's path, built first when missing or stale; null when it cannot be
 * built here (e.g. esbuild missing), so the caller can run the sources with tsx.
 */
export async function ensureCliBundle(root, log = (message) => process.stderr.write(`${message}\n`)) {
  if (cliBundleIsFresh(root)) return path.join(root, CLI_BUNDLE);
  try {
    log(`note: building the command line into ${OUT_DIR} (sources changed or first run)…`);
    return await buildCliBundle(root);
  } catch (error) {
    log(
      `note: the prebuilt command line could not be built (${error instanceof Error ? error.message : String(error)}); running the sources with tsx.`,
    );
    return null;
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const root = path.resolve(import.meta.dirname, '..');
  const started = performance.now();
  const bundle = await buildCliBundle(root);
  console.log(`Built ${path.relative(root, bundle)} in ${Math.round(performance.now() - started)} ms.`);
}
