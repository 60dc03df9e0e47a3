// `npm run cli` runs a prebuilt bundle of the engine command line (scripts/cli.mjs,
// scripts/cli-bundle.mjs). It must answer exactly as the TypeScript sources do,
// and be rebuilt whenever a source it was built from changes.
import { createHash } from 'node:crypto';
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, symlinkSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildCliBundle, cliBundleIsFresh, CLI_BUNDLE } from '../../scripts/cli-bundle.mjs';
import { repoRoot as root, runProcess, tempFiles, type Run } from './support/cli-process';

const { file } = tempFiles('slackwater-cli-bundle-');

const npmCli = (args: readonly string[], sources: boolean): Promise<Run> =>
  runProcess('npm', ['run', '--silent', 'cli', '--', ...args], { ...process.env, SLACKWATER_CLI_SOURCES: sources ? '1' : '0' });

// Three local days of 15-minute prices with a site load, so the DP and LP paths both run.
const quarters = Array.from({ length: 288 }, (_, k) => k);
const stamp = (k: number) => new Date(Date.UTC(2026, 2, 28, 0, 15 * k)).toISOString();
const prices = file(
  'prices.csv',
  ['time,price', ...quarters.map((k) => `${stamp(k)},${(45 + 35 * Math.sin(k / 14) - (k % 61 === 7 ? 80 : 0)).toFixed(2)}`)].join(
    '\n',
  ),
);
const load = file(
  'load.csv',
  ['time,load', ...quarters.map((k) => `${stamp(k)},${(300 + 200 * Math.cos(k / 20)).toFixed(1)}`)].join('\n'),
);
const battery = file(
  'battery.json',
  JSON.stringify({
    powerChargeKw: 500,
    powerDischargeKw: 400,
    energyKwh: 1000,
    socMinPct: 10,
    socMaxPct: 95,
    socInitialPct: 30,
    efficiencyCharge: 0.93,
    efficiencyDischarge: 0.95,
    selfDischargePctPerHour: 0.1,
    degradationCostPerMwh: 4,
    maxCyclesPerDay: null,
  }),
);
const site = file(
  'site.json',
  JSON.stringify({ timezone: 'Europe/Berlin', importLimitKw: 900, exportLimitKw: 600, demandChargePerKw: null }),
);
const common = ['--prices', prices, '--load', load, '--battery', battery, '--site', site];
const COMMANDS: Record<string, readonly string[]> = {
  steady: ['steady', ...common],
  reference: ['reference', ...common, '--terminal', 'cyclic'],
  plan: [
    'plan',
    ...common,
    '--start',
    '2026-03-29T00:00',
    '--end',
    '2026-03-29T12:00',
    '--horizon',
    '24',
    '--terminal',
    'steady-value',
  ],
  study: [
    'study',
    ...common,
    '--horizons',
    '2,6,24',
    '--replan',
    '1',
    '--terminal',
    'free,steady-value,target:50',
    '--workers',
    '1',
  ],
  studyLp: ['study', ...common, '--horizons', '3,6', '--replan', '2', '--terminal', 'free', '--method', 'lp', '--workers', '2'],
  badInput: [
    'plan',
    ...common,
    '--start',
    '2026-03-29T02:30',
    '--end',
    '2026-03-29T12:00',
    '--horizon',
    '24',
    '--terminal',
    'free',
  ],
};

// Timings differ between any two runs; everything else must match byte for byte.
const withoutTimes = (text: string) => text.replace(/"seconds":[-0-9.e+]+/g, '"seconds":0');
const withoutBuildNote = (text: string) => text.replace(/^note: building the command line.*\n/m, '');

const results: Record<string, { bundle: Run; sources: Run }> = {};

beforeAll(async () => {
  // The first run builds the bundle if needed, before the runs that compare.
  await npmCli(['--help'], false);
  await Promise.all(
    Object.entries(COMMANDS).map(async ([name, args]) => {
      const [bundle, sources] = await Promise.all([npmCli(args, false), npmCli(args, true)]);
      results[name] = { bundle, sources };
    }),
  );
}, 180_000);

describe('the prebuilt command line', () => {
  it.each(Object.keys(COMMANDS))('answers %s exactly as the TypeScript sources do', (name) => {
    // [D] The sources run through tsx are the reference; the bundle is the same code.
    const { bundle, sources } = results[name]!;
    expect(bundle.code).toBe(sources.code);
    expect(withoutTimes(bundle.stdout)).toBe(withoutTimes(sources.stdout));
    expect(withoutBuildNote(bundle.stderr)).toBe(sources.stderr);
    if (name === 'badInput') expect(bundle.code).toBe(2);
    else expect(bundle.stdout.length).toBeGreaterThan(100);
  });

  it('ran the solves on worker threads from the bundle when asked to', () => {
    expect(JSON.parse(results.studyLp!.bundle.stdout).workers).toBe(2);
  });
});

describe('the bundle manifest', () => {
  const copy = mkdtempSync(join(tmpdir(), 'slackwater-cli-root-'));

  beforeAll(async () => {
    for (const part of ['server', 'shared', 'scripts', 'tsconfig.json', 'package.json'])
      cpSync(join(root, part), join(copy, part), { recursive: true });
    symlinkSync(join(root, 'node_modules'), join(copy, 'node_modules'));
    await buildCliBundle(copy);
  }, 60_000);

  afterAll(() => rmSync(copy, { recursive: true, force: true }));

  it('stays current when a source is only touched, and goes stale when one changes or a bundle file is missing', async () => {
    expect(cliBundleIsFresh(copy)).toBe(true);
    const source = join(copy, 'server/engine/dp/stage-cost.ts');
    const later = new Date(Date.now() + 60_000);
    utimesSync(source, later, later);
    expect(cliBundleIsFresh(copy)).toBe(true);
    // Same size, different content (the final newline becomes a space): the hash tells.
    const text = readFileSync(source, 'utf8');
    const changed = `${text.slice(0, -1)} `;
    writeFileSync(source, changed);
    expect(cliBundleIsFresh(copy)).toBe(false);
    await buildCliBundle(copy);
    expect(cliBundleIsFresh(copy)).toBe(true);
    const manifest = JSON.parse(readFileSync(join(copy, 'dist/cli/manifest.json'), 'utf8'));
    expect(manifest.inputs['server/engine/dp/stage-cost.ts'].sha256).toBe(createHash('sha256').update(changed).digest('hex'));
    expect(existsSync(join(copy, CLI_BUNDLE))).toBe(true);
    rmSync(join(copy, 'dist/cli/study-worker.mjs'));
    expect(cliBundleIsFresh(copy)).toBe(false);
  }, 60_000);
});
